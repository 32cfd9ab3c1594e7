import { ApiProperty } from '@nestjs/swagger';
import { PREFERRED_UNITS, type PreferredUnits, type SessionUser } from '../../common/types/access-context';

/** The signed-in user on the wire (OpenAPI shape of `SessionUser`). */
export class SessionUserDto implements SessionUser {
  @ApiProperty({ format: 'uuid' }) id!: string;
  @ApiProperty({ example: 'rowan@harrow-lane.example' }) email!: string;
  @ApiProperty({ example: 'Rowan Avery' }) displayName!: string;
  @ApiProperty() isAdmin!: boolean;
  @ApiProperty({ enum: PREFERRED_UNITS }) preferredUnits!: PreferredUnits;
  @ApiProperty() emailVerified!: boolean;
}

export class MeResponseDto {
  @ApiProperty({ type: SessionUserDto, nullable: true, description: 'null when signed out' })
  user!: SessionUserDto | null;
}
