import { Body, Controller, Get, Param, Put } from '@nestjs/common';
import {
  ApiBadRequestResponse,
  ApiForbiddenResponse,
  ApiNotFoundResponse,
  ApiOkResponse,
  ApiTags,
  ApiUnauthorizedResponse,
} from '@nestjs/swagger';
import { CurrentSession } from '../auth/current-session.decorator';
import type { Session } from '../auth/session';
import { ApiErrorDto } from '../common/api-error.dto';
import { ShopProfileDto, toShopProfileDto, UpdateShopProfileDto } from './dto/shop-profile.dto';
import { ShopProfilesService } from './shop-profiles.service';

@ApiTags('shop profiles')
@ApiUnauthorizedResponse({ type: ApiErrorDto, description: 'Not signed in' })
@ApiNotFoundResponse({ type: ApiErrorDto, description: 'No member has this login' })
@Controller('members/:login/shop-profile')
export class ShopProfilesController {
  constructor(private readonly profiles: ShopProfilesService) {}

  @Get()
  @ApiOkResponse({
    type: ShopProfileDto,
    description: 'Your kerf, sheet and bar sizes, milling allowance and prices; the defaults until you save',
  })
  @ApiForbiddenResponse({ type: ApiErrorDto, description: "Another member's shop profile" })
  async get(@CurrentSession() session: Session, @Param('login') login: string): Promise<ShopProfileDto> {
    return toShopProfileDto(await this.profiles.profileOf(session, login));
  }

  @Put()
  @ApiOkResponse({ type: ShopProfileDto, description: 'The profile as saved' })
  @ApiBadRequestResponse({
    type: ApiErrorDto,
    description: 'A value out of range, or two prices for one material and unit',
  })
  @ApiForbiddenResponse({ type: ApiErrorDto, description: "Another member's shop profile, or you are suspended" })
  async save(
    @CurrentSession() session: Session,
    @Param('login') login: string,
    @Body() profile: UpdateShopProfileDto,
  ): Promise<ShopProfileDto> {
    return toShopProfileDto(await this.profiles.save(session, login, profile));
  }
}
