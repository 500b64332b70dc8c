import { Body, Controller, Get, Param, Patch } from '@nestjs/common';
import {
  ApiForbiddenResponse,
  ApiNotFoundResponse,
  ApiOkResponse,
  ApiTags,
  ApiUnauthorizedResponse,
} from '@nestjs/swagger';
import { Public } from '../auth/public.decorator';
import { CurrentSession } from '../auth/current-session.decorator';
import type { Session } from '../auth/session';
import { ApiErrorDto } from '../common/api-error.dto';
import { MemberDto, MemberProfileDto, toMemberDto, toMemberProfileDto } from './dto/member.dto';
import { SettingsDto, toSettingsDto, UpdateSettingsDto } from './dto/settings.dto';
import { MembersService } from './members.service';

@ApiTags('members')
@Controller()
export class MembersController {
  constructor(private readonly members: MembersService) {}

  @Get('me')
  @ApiOkResponse({ type: MemberDto, description: 'The signed-in member' })
  @ApiUnauthorizedResponse({ type: ApiErrorDto, description: 'Not signed in, or the session has expired' })
  async me(@CurrentSession() session: Session): Promise<MemberDto> {
    const member = await this.members.findById(session.memberId);
    // The session lookup found the member a moment ago; only a deletion in between lands here.
    if (!member) throw new Error('The member of a live session is missing');
    return toMemberDto(member);
  }

  @Public()
  @Get('members/:login')
  @ApiOkResponse({ type: MemberProfileDto, description: "A member's public profile" })
  @ApiNotFoundResponse({ type: ApiErrorDto, description: 'No member has this login' })
  async profile(@Param('login') login: string): Promise<MemberProfileDto> {
    return toMemberProfileDto(await this.members.getByLogin(login));
  }

  @Get('members/:login/settings')
  @ApiOkResponse({ type: SettingsDto, description: 'Your display name, units and e-mail notifications' })
  @ApiUnauthorizedResponse({ type: ApiErrorDto, description: 'Not signed in' })
  @ApiForbiddenResponse({ type: ApiErrorDto, description: "Another member's settings" })
  @ApiNotFoundResponse({ type: ApiErrorDto, description: 'No member has this login' })
  async settings(@CurrentSession() session: Session, @Param('login') login: string): Promise<SettingsDto> {
    return toSettingsDto(await this.members.settingsOf(session, login));
  }

  @Patch('members/:login/settings')
  @ApiOkResponse({ type: SettingsDto, description: 'The settings as saved' })
  @ApiUnauthorizedResponse({ type: ApiErrorDto, description: 'Not signed in' })
  @ApiForbiddenResponse({ type: ApiErrorDto, description: "Another member's settings, or you are suspended" })
  @ApiNotFoundResponse({ type: ApiErrorDto, description: 'No member has this login' })
  async updateSettings(
    @CurrentSession() session: Session,
    @Param('login') login: string,
    @Body() changes: UpdateSettingsDto,
  ): Promise<SettingsDto> {
    return toSettingsDto(await this.members.updateSettings(session, login, changes));
  }
}
