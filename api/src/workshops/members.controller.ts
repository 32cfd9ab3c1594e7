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
  Patch,
  Post,
} from '@nestjs/common';
import { ApiNoContentResponse, ApiOkResponse, ApiTags } from '@nestjs/swagger';
import { WorkshopEditor, WorkshopOwner } from '../common/decorators/access.decorator';
import { CurrentMembership } from '../common/decorators/current-membership.decorator';
import type { WorkshopMembership } from '../common/types/access-context';
import { ChangeRoleDto, TransferOwnershipDto } from './dto/members.dto';
import { MemberView } from './dto/workshop-views.dto';
import { MembersService } from './members.service';

/** A member id that is not even a UUID names no member. */
const userIdPipe = new ParseUUIDPipe({
  exceptionFactory: () => new NotFoundException({ message: 'Member not found', code: 'member_not_found' }),
});

@ApiTags('workshops')
@Controller('workshops/:workshopId')
export class MembersController {
  constructor(@Inject(MembersService) private readonly members: MembersService) {}

  @WorkshopEditor()
  @Get('members')
  @ApiOkResponse({ type: [MemberView] })
  list(@CurrentMembership() membership: WorkshopMembership): Promise<MemberView[]> {
    return this.members.list(membership.workshopId);
  }

  @WorkshopOwner()
  @Patch('members/:userId')
  @ApiOkResponse({ type: MemberView })
  changeRole(
    @CurrentMembership() membership: WorkshopMembership,
    @Param('userId', userIdPipe) userId: string,
    @Body() dto: ChangeRoleDto,
  ): Promise<MemberView> {
    return this.members.changeRole(membership.workshopId, userId, dto.role);
  }

  @WorkshopOwner()
  @Delete('members/:userId')
  @HttpCode(HttpStatus.NO_CONTENT)
  @ApiNoContentResponse()
  remove(@CurrentMembership() membership: WorkshopMembership, @Param('userId', userIdPipe) userId: string): Promise<void> {
    return this.members.remove(membership.workshopId, userId);
  }

  @WorkshopOwner()
  @Post('transfer-ownership')
  @ApiOkResponse({ type: [MemberView], description: 'The chosen member is owner; the caller is an editor' })
  @HttpCode(HttpStatus.OK)
  transfer(@CurrentMembership() membership: WorkshopMembership, @Body() dto: TransferOwnershipDto): Promise<MemberView[]> {
    return this.members.transferOwnership(membership, dto.userId);
  }

  @WorkshopEditor()
  @Post('leave')
  @HttpCode(HttpStatus.NO_CONTENT)
  @ApiNoContentResponse({ description: 'Left the workshop (the last owner cannot)' })
  leave(@CurrentMembership() membership: WorkshopMembership): Promise<void> {
    return this.members.leave(membership);
  }
}
