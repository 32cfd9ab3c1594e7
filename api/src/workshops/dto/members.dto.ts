import { ApiProperty } from '@nestjs/swagger';
import { Transform } from 'class-transformer';
import { IsEmail, IsIn, IsString, IsUUID, Length, MaxLength } from 'class-validator';
import { MEMBER_ROLES, type MemberRole } from '../../common/types/access-context';

export class ChangeRoleDto {
  @ApiProperty({ enum: MEMBER_ROLES })
  @IsIn(MEMBER_ROLES, { message: 'Role must be owner or editor' })
  role!: MemberRole;
}

export class TransferOwnershipDto {
  @ApiProperty({ format: 'uuid', description: 'The member who becomes owner; you become an editor' })
  @IsUUID('all', { message: 'Choose a member' })
  userId!: string;
}

export class CreateInvitationDto {
  @ApiProperty({ example: 'sam@harrow-lane.example' })
  @Transform(({ value }: { value: unknown }) => (typeof value === 'string' ? value.trim() : value))
  @IsEmail({}, { message: 'Enter a valid e-mail address' })
  @MaxLength(254, { message: 'E-mail address is too long' })
  email!: string;

  @ApiProperty({ enum: MEMBER_ROLES, example: 'editor' })
  @IsIn(MEMBER_ROLES, { message: 'Role must be owner or editor' })
  role!: MemberRole;
}

export class InvitationTokenDto {
  @ApiProperty({ description: 'The token from the invitation link' })
  @IsString({ message: 'The invitation link is incomplete' })
  @Length(20, 128, { message: 'The invitation link is incomplete' })
  token!: string;
}
