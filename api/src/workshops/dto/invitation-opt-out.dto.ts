import { ApiProperty } from '@nestjs/swagger';
import { IsBoolean, IsString, Length } from 'class-validator';

/** The token of an invitation mail's "stop invitations to this address" link. */
export class InvitationOptOutQueryDto {
  @ApiProperty({ description: 'The token from the link in an invitation mail' })
  @IsString({ message: 'The link is incomplete' })
  @Length(20, 128, { message: 'The link is incomplete' })
  token!: string;
}

export class InvitationOptOutChangeDto {
  @ApiProperty({ description: 'true: no more invitations to this address; false: invitations allowed again' })
  @IsBoolean({ message: 'stopped must be true or false' })
  stopped!: boolean;
}

/** Whether the link's address takes invitations. */
export class InvitationOptOutView {
  @ApiProperty({ description: 'The address the link was sent to' }) email!: string;
  @ApiProperty({ description: 'Invitations to this address are refused' }) stopped!: boolean;
  @ApiProperty({ nullable: true, type: String, description: 'Since when (ISO 8601), when stopped' }) stoppedSince!: string | null;
}
