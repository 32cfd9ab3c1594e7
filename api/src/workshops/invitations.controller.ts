import {
  Body,
  Controller,
  Delete,
  Get,
  HttpCode,
  HttpStatus,
  Inject,
  NotFoundException,
  Param,
  ParseUUIDPipe,
  Post,
  Put,
  Query,
} from '@nestjs/common';
import { ApiConflictResponse, ApiCreatedResponse, ApiNoContentResponse, ApiNotFoundResponse, ApiOkResponse, ApiTags } from '@nestjs/swagger';
import { Public, SignedIn, WorkshopOwner } from '../common/decorators/access.decorator';
import { CurrentMembership } from '../common/decorators/current-membership.decorator';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import type { SessionUser, WorkshopMembership } from '../common/types/access-context';
import { CreateInvitationDto, InvitationTokenDto } from './dto/members.dto';
import { AcceptedInvitation, InvitationPreview, InvitationView } from './dto/workshop-views.dto';
import { InvitationOptOutChangeDto, InvitationOptOutQueryDto, InvitationOptOutView } from './dto/invitation-opt-out.dto';
import { InvitationOptOutsService } from './invitation-opt-outs.service';
import { InvitationsService } from './invitations.service';

const invitationIdPipe = new ParseUUIDPipe({
  exceptionFactory: () => new NotFoundException({ message: 'Invitation not found', code: 'invitation_not_found' }),
});

/** The owner's side: invite, list pending, revoke. */
@ApiTags('workshops')
@Controller('workshops/:workshopId/invitations')
export class WorkshopInvitationsController {
  constructor(@Inject(InvitationsService) private readonly invitations: InvitationsService) {}

  @WorkshopOwner()
  @Get()
  @ApiOkResponse({ type: [InvitationView], description: 'Invitations not yet accepted' })
  list(@CurrentMembership() membership: WorkshopMembership): Promise<InvitationView[]> {
    return this.invitations.listPending(membership.workshopId);
  }

  @WorkshopOwner()
  @Post()
  @ApiCreatedResponse({ type: InvitationView, description: 'Invited; the link was e-mailed (valid 7 days)' })
  @ApiConflictResponse({ description: 'Already a member (already_member), or the address stopped invitations (invitations_stopped)' })
  invite(
    @CurrentMembership() membership: WorkshopMembership,
    @CurrentUser() user: SessionUser,
    @Body() dto: CreateInvitationDto,
  ): Promise<InvitationView> {
    return this.invitations.invite(membership, user, dto);
  }

  @WorkshopOwner()
  @Delete(':invitationId')
  @HttpCode(HttpStatus.NO_CONTENT)
  @ApiNoContentResponse()
  revoke(
    @CurrentMembership() membership: WorkshopMembership,
    @Param('invitationId', invitationIdPipe) invitationId: string,
  ): Promise<void> {
    return this.invitations.revoke(membership.workshopId, invitationId);
  }
}

/** The invitee's side: the link's page reads the invitation, then the signed-in invitee accepts. */
@ApiTags('workshops')
@Controller('invitations')
export class InvitationsController {
  constructor(
    @Inject(InvitationsService) private readonly invitations: InvitationsService,
    @Inject(InvitationOptOutsService) private readonly optOuts: InvitationOptOutsService,
  ) {}

  /** The token travels in the query string, which the request log never records. */
  @Public()
  @Get('lookup')
  @ApiOkResponse({ type: InvitationPreview })
  preview(@Query() query: InvitationTokenDto): Promise<InvitationPreview> {
    return this.invitations.preview(query.token);
  }

  @SignedIn()
  @Post('accept')
  @HttpCode(HttpStatus.OK)
  @ApiOkResponse({ type: AcceptedInvitation })
  accept(@CurrentUser() user: SessionUser, @Body() dto: InvitationTokenDto): Promise<AcceptedInvitation> {
    return this.invitations.accept(user, dto.token);
  }

  /** The "stop invitations" link in every invitation mail: no sign-in, the token is the key. */
  @Public()
  @Get('opt-out')
  @ApiOkResponse({ type: InvitationOptOutView })
  @ApiNotFoundResponse({ description: 'Unknown token' })
  optOut(@Query() query: InvitationOptOutQueryDto): Promise<InvitationOptOutView> {
    return this.optOuts.view(query.token);
  }

  /** Stops invitations to the link's address, or allows them again. */
  @Public()
  @Put('opt-out')
  @ApiOkResponse({ type: InvitationOptOutView })
  @ApiNotFoundResponse({ description: 'Unknown token' })
  setOptOut(@Query() query: InvitationOptOutQueryDto, @Body() body: InvitationOptOutChangeDto): Promise<InvitationOptOutView> {
    return this.optOuts.set(query.token, body.stopped);
  }
}
