import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { IsIn, IsOptional, IsString, IsUUID, Length } from 'class-validator';
import { FOLLOW_TARGET_KINDS, type FollowTargetKind } from '../entities/follow.entity';

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
  @ApiPropertyOptional({ description: 'Sent by mail clients on one-click unsubscribe; ignored' })
  @IsOptional()
  @IsString()
  'List-Unsubscribe'?: string;
}
