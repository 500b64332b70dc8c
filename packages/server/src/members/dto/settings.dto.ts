import { ApiProperty, ApiPropertyOptional, PartialType } from '@nestjs/swagger';
import { Transform, Type } from 'class-transformer';
import { IsBoolean, IsIn, IsNotEmpty, IsOptional, IsString, MaxLength, ValidateNested } from 'class-validator';
import { UNITS, type Member, type Units } from '../entities/member.entity';

/** One switch per kind of e-mail the site sends (DESIGN.md §3.8). */
export class NotificationSettingsDto {
  @ApiProperty({ description: 'A revision of your plan was published or sent back' })
  @IsBoolean()
  revisionDecided: boolean;

  @ApiProperty({ description: 'Someone reported a build of your plan' })
  @IsBoolean()
  buildReported: boolean;

  @ApiProperty({ description: 'Someone adapted your plan' })
  @IsBoolean()
  planAdapted: boolean;

  @ApiProperty({ description: 'A flag you raised was resolved' })
  @IsBoolean()
  flagResolved: boolean;
}

export class UpdateNotificationSettingsDto extends PartialType(NotificationSettingsDto) {}

export class SettingsDto {
  @ApiProperty()
  displayName: string;

  @ApiProperty({ enum: UNITS })
  units: Units;

  @ApiProperty({ type: NotificationSettingsDto })
  notifications: NotificationSettingsDto;
}

export class UpdateSettingsDto {
  @ApiPropertyOptional({ maxLength: 100 })
  @IsOptional()
  @Transform(({ value }: { value: unknown }) => (typeof value === 'string' ? value.trim() : value))
  @IsString()
  @IsNotEmpty({ message: 'displayName must not be empty' })
  @MaxLength(100)
  displayName?: string;

  @ApiPropertyOptional({ enum: UNITS })
  @IsOptional()
  @IsIn(UNITS)
  units?: Units;

  @ApiPropertyOptional({ type: UpdateNotificationSettingsDto })
  @IsOptional()
  @ValidateNested()
  @Type(() => UpdateNotificationSettingsDto)
  notifications?: UpdateNotificationSettingsDto;
}

export function toSettingsDto(member: Member): SettingsDto {
  return {
    displayName: member.displayName,
    units: member.units,
    notifications: {
      revisionDecided: member.notifyRevisionDecided,
      buildReported: member.notifyBuildReported,
      planAdapted: member.notifyPlanAdapted,
      flagResolved: member.notifyFlagResolved,
    },
  };
}
