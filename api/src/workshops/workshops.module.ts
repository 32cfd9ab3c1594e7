import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { UsersModule } from '../users/users.module';
import { InvitationOptOut, InvitationOptOutLink } from './entities/invitation-opt-out.entity';
import { Invitation } from './entities/invitation.entity';
import { WorkshopMember } from './entities/workshop-member.entity';
import { Workshop } from './entities/workshop.entity';
import { InvitationsController, WorkshopInvitationsController } from './invitations.controller';
import { InvitationOptOutsService } from './invitation-opt-outs.service';
import { InvitationsService } from './invitations.service';
import { MembersController } from './members.controller';
import { MembersService } from './members.service';
import { MembershipService } from './membership.service';
import { WorkshopsController } from './workshops.controller';
import { WorkshopsService } from './workshops.service';

@Module({
  imports: [TypeOrmModule.forFeature([Workshop, WorkshopMember, Invitation, InvitationOptOut, InvitationOptOutLink]), UsersModule],
  controllers: [WorkshopsController, MembersController, WorkshopInvitationsController, InvitationsController],
  providers: [WorkshopsService, MembersService, InvitationsService, InvitationOptOutsService, MembershipService],
  exports: [MembershipService, WorkshopsService, MembersService, TypeOrmModule],
})
export class WorkshopsModule {}
