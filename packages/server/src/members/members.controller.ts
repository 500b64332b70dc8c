import { Controller, Get, NotFoundException, Req } from '@nestjs/common';
import { ApiOkResponse, ApiTags, ApiUnauthorizedResponse } from '@nestjs/swagger';
import type { Request } from 'express';
import { sessionOf } from '../auth/session';
import { MemberDto, toMemberDto } from './dto/member.dto';
import { MembersService } from './members.service';

@ApiTags('members')
@Controller()
export class MembersController {
  constructor(private readonly members: MembersService) {}

  @Get('me')
  @ApiOkResponse({ type: MemberDto, description: 'The signed-in member' })
  @ApiUnauthorizedResponse({ description: 'Not signed in' })
  async me(@Req() request: Request): Promise<MemberDto> {
    const member = await this.members.findById(sessionOf(request).memberId);
    if (!member) throw new NotFoundException('This member no longer exists');
    return toMemberDto(member);
  }
}
