import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { ArrayMaxSize, IsArray, IsBoolean, IsIn, IsInt, IsOptional, IsString, IsUUID, Length, Max, Min, ValidateNested } from 'class-validator';
import { FIT_REPORT_MAIL, type FitReportMail } from '../entities/mail-preference.entity';
import { FOLLOW_DELIVERIES, FOLLOW_TARGET_KINDS, type FollowDelivery, type FollowTargetKind } from '../entities/follow.entity';

export class FollowDeliveryDto {
  @ApiProperty({ enum: FOLLOW_DELIVERIES, description: 'at_once (default), daily or weekly digest, or paused' })
  @IsIn(FOLLOW_DELIVERIES)
  delivery!: FollowDelivery;
}

export class FollowDeliveryChangeDto extends FollowDeliveryDto {
  @ApiProperty()
  @IsUUID()
  followId!: string;
}

export class UpdateMailPreferencesDto {
  @ApiPropertyOptional({ example: 'Europe/Berlin', description: 'IANA time zone the digest hour is in' })
  @IsOptional()
  @IsString()
  @Length(1, 64)
  timeZone?: string;

  @ApiPropertyOptional({ minimum: 0, maximum: 23, description: 'Local hour the digests go out' })
  @IsOptional()
  @IsInt()
  @Min(0)
  @Max(23)
  digestHour?: number;

  @ApiPropertyOptional({ minimum: 0, maximum: 6, description: 'Weekly digest day: 0 = Sunday … 6 = Saturday' })
  @IsOptional()
  @IsInt()
  @Min(0)
  @Max(6)
  digestWeekday?: number;

  @ApiPropertyOptional({ enum: FIT_REPORT_MAIL, description: 'Workshop owners and editors: mail when a fit report arrives' })
  @IsOptional()
  @IsIn(FIT_REPORT_MAIL)
  fitReportMail?: FitReportMail;

  @ApiPropertyOptional({ description: 'true resumes mail paused after the address refused it' })
  @IsOptional()
  @IsBoolean()
  resume?: boolean;

  @ApiPropertyOptional({ type: [FollowDeliveryChangeDto], description: 'New delivery for some of your follows' })
  @IsOptional()
  @IsArray()
  @ArrayMaxSize(500)
  @ValidateNested({ each: true })
  @Type(() => FollowDeliveryChangeDto)
  follows?: FollowDeliveryChangeDto[];
}

export class MailLinkQueryDto {
  @ApiProperty({ description: 'The token from a mail’s preferences or unsubscribe link' })
  @IsString()
  @Length(20, 200)
  token!: string;
}

export class FollowPreferenceDto {
  @ApiProperty() id!: string;
  @ApiProperty({ enum: FOLLOW_TARGET_KINDS }) targetKind!: FollowTargetKind;
  @ApiProperty() label!: string;
  @ApiProperty() workshopName!: string;
  @ApiProperty({ enum: FOLLOW_DELIVERIES }) delivery!: FollowDelivery;
}

export class MailPreferencesDto {
  @ApiProperty({ description: 'The address mail goes to' }) email!: string;
  @ApiProperty({ example: 'UTC' }) timeZone!: string;
  @ApiProperty() digestHour!: number;
  @ApiProperty() digestWeekday!: number;
  @ApiProperty({ enum: FIT_REPORT_MAIL }) fitReportMail!: FitReportMail;
  @ApiProperty({ nullable: true, type: String, description: 'Set when mail to the address is paused after repeated refusals' })
  pausedAt!: string | null;
  @ApiProperty({ nullable: true, type: String, description: 'Why mail is paused: the mail server’s last answer' })
  pausedNote!: string | null;
  @ApiProperty({ type: [FollowPreferenceDto] }) follows!: FollowPreferenceDto[];
}
