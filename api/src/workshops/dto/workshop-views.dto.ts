import { ApiProperty } from '@nestjs/swagger';
import { MEMBER_ROLES, type MemberRole } from '../../common/types/access-context';

export class WorkshopView {
  @ApiProperty({ format: 'uuid' }) id!: string;
  @ApiProperty({ example: 'harrow-lane-garage' }) slug!: string;
  @ApiProperty({ example: 'Harrow Lane Garage' }) name!: string;
  @ApiProperty() description!: string;
  @ApiProperty({ nullable: true, type: String, description: 'A time-limited link to the logo image' })
  logoUrl!: string | null;
  @ApiProperty({ description: 'Disabled by a site admin: readable, not changeable' }) disabled!: boolean;
  @ApiProperty({ description: 'Members’ names may appear on public pages (who confirmed a fit)' }) showMemberNames!: boolean;
  @ApiProperty({ enum: [...MEMBER_ROLES, 'admin'], nullable: true, description: "The caller's role" })
  role!: MemberRole | 'admin' | null;
  @ApiProperty() createdAt!: string;
}

export class MemberView {
  @ApiProperty({ format: 'uuid' }) userId!: string;
  @ApiProperty() displayName!: string;
  @ApiProperty() email!: string;
  @ApiProperty({ enum: MEMBER_ROLES }) role!: MemberRole;
  @ApiProperty() joinedAt!: string;
}

export class InvitationView {
  @ApiProperty({ format: 'uuid' }) id!: string;
  @ApiProperty() email!: string;
  @ApiProperty({ enum: MEMBER_ROLES }) role!: MemberRole;
  @ApiProperty() expiresAt!: string;
  @ApiProperty() expired!: boolean;
  @ApiProperty({ nullable: true, type: String }) invitedBy!: string | null;
  @ApiProperty() createdAt!: string;
}

/** What the invitation link shows before it is accepted. */
export class InvitationPreview {
  @ApiProperty() workshop!: { id: string; name: string; slug: string };
  @ApiProperty() email!: string;
  @ApiProperty({ enum: MEMBER_ROLES }) role!: MemberRole;
  @ApiProperty({ nullable: true, type: String }) invitedBy!: string | null;
  @ApiProperty() expiresAt!: string;
  @ApiProperty({ enum: ['pending', 'accepted', 'expired'] }) status!: 'pending' | 'accepted' | 'expired';
}

export class AcceptedInvitation {
  @ApiProperty({ format: 'uuid' }) workshopId!: string;
  @ApiProperty({ enum: MEMBER_ROLES }) role!: MemberRole;
}

export class AdminWorkshopView {
  @ApiProperty({ format: 'uuid' }) id!: string;
  @ApiProperty() slug!: string;
  @ApiProperty() name!: string;
  @ApiProperty() disabled!: boolean;
  @ApiProperty() memberCount!: number;
  @ApiProperty({ type: [String] }) owners!: string[];
  @ApiProperty() createdAt!: string;
}
