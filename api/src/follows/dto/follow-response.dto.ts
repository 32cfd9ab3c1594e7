import { ApiProperty } from '@nestjs/swagger';
import { FOLLOW_DELIVERIES, FOLLOW_TARGET_KINDS, type FollowDelivery, type FollowTargetKind } from '../entities/follow.entity';

export class FollowWorkshopDto {
  @ApiProperty({ example: 'Hollow Lane Garage' }) name!: string;
  @ApiProperty({ example: 'hollow-lane-garage' }) slug!: string;
}

/** A follow as its follower reads it. */
export class FollowResponseDto {
  @ApiProperty({ format: 'uuid' }) id!: string;
  @ApiProperty({ enum: FOLLOW_TARGET_KINDS }) targetKind!: FollowTargetKind;
  @ApiProperty({ format: 'uuid' }) targetId!: string;
  @ApiProperty({ example: 'Van conversion drive line', description: "The workshop's, build's or assembly's name; (removed) once it is gone" })
  label!: string;
  @ApiProperty({ enum: FOLLOW_DELIVERIES, description: 'How its fit news is mailed' }) delivery!: FollowDelivery;
  @ApiProperty({ type: FollowWorkshopDto }) workshop!: FollowWorkshopDto;
  @ApiProperty({ format: 'date-time' }) createdAt!: string;
}
