import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { IsIn, IsOptional, IsString, IsUUID, Length } from 'class-validator';
import { FOLLOW_DELIVERIES, FOLLOW_TARGET_KINDS, type FollowDelivery, type FollowTargetKind } from '../entities/follow.entity';
import { UNSUBSCRIBE_SCOPES, type UnsubscribeScope } from '../follows.service';

export class CreateFollowDto {
  @ApiProperty({ enum: FOLLOW_TARGET_KINDS })
  @IsIn(FOLLOW_TARGET_KINDS)
  targetKind!: FollowTargetKind;

  @ApiProperty({ description: 'The id of the workshop, build or assembly (a published guide gives them as followTargets)' })
  @IsUUID()
  targetId!: string;
}

/** The token comes in the query (RFC 8058 one-click posts carry only "List-Unsubscribe=One-Click") or in the body. */
export class UnsubscribeQueryDto {
  @ApiPropertyOptional()
  @IsOptional()
  @IsString()
  @Length(20, 200)
  token?: string;
}

export class UnsubscribeBodyDto extends UnsubscribeQueryDto {
  @ApiPropertyOptional({
    description: 'Stop this other follow instead: one of the `stillFollowing` the first answer listed (same token, no sign-in)',
  })
  @IsOptional()
  @IsUUID()
  followId?: string;

  @ApiPropertyOptional({
    enum: UNSUBSCRIBE_SCOPES,
    description: 'this (default): what sent the mail; workshop: every follow and report news in its workshop; everything: all fit news',
  })
  @IsOptional()
  @IsIn(UNSUBSCRIBE_SCOPES)
  scope?: UnsubscribeScope;

  @ApiPropertyOptional({ description: 'Sent by mail clients on one-click unsubscribe; ignored' })
  @IsOptional()
  @IsString()
  'List-Unsubscribe'?: string;
}

export class UnsubscribedFollowDto {
  @ApiProperty() id!: string;
  @ApiProperty({ enum: FOLLOW_TARGET_KINDS }) targetKind!: FollowTargetKind;
  @ApiProperty() targetId!: string;
  @ApiProperty() label!: string;
  @ApiProperty({ example: { name: 'Harrow Lane Garage', slug: 'harrow-lane' } }) workshop!: { name: string; slug: string };
  @ApiProperty() createdAt!: string;
  @ApiProperty({ enum: FOLLOW_DELIVERIES }) delivery!: FollowDelivery;
}

/** What the unsubscribe link did, and what would still bring news of the same assembly. */
export class UnsubscribeResultDto {
  @ApiProperty({ enum: ['unfollowed', 'already'], description: '`already` when the link had been used before' })
  status!: 'unfollowed' | 'already';

  @ApiProperty({
    enum: ['follow', 'report', 'digest', 'fit_report_mail', 'workshop', 'everything'],
    description:
      'What stopped: the follow or the fit report the e-mail came through, a digest, the mail about new fit reports (members), all news from a workshop, or all fit news',
  })
  stopped!: 'follow' | 'report' | 'digest' | 'fit_report_mail' | 'workshop' | 'everything';

  @ApiProperty({ description: 'What the e-mail named: the followed workshop, build or assembly, or "your fit report"' })
  label!: string;

  @ApiProperty({ type: [UnsubscribedFollowDto], description: 'The person\'s other follows that still bring news of the same assembly (closest first)' })
  stillFollowing!: UnsubscribedFollowDto[];
}
