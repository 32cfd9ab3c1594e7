import { Controller, Get, HttpCode, HttpStatus, Inject, NotFoundException, Param, ParseUUIDPipe, Post, Query } from '@nestjs/common';
import { ApiNoContentResponse, ApiOkResponse, ApiTags } from '@nestjs/swagger';
import { AdminOnly } from '../common/decorators/access.decorator';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import type { SessionUser } from '../common/types/access-context';
import { AdminService } from './admin.service';
import { AdminSearchDto, AdminUserPageDto, AdminWorkshopPageDto } from './dto/admin.dto';

const uuid = (what: string) =>
  new ParseUUIDPipe({ exceptionFactory: () => new NotFoundException({ message: `${what} not found` }) });

/** Site administration: every route here is for site admins only. */
@ApiTags('admin')
@AdminOnly()
@Controller('admin')
export class AdminController {
  constructor(@Inject(AdminService) private readonly admin: AdminService) {}

  @Get('users')
  @ApiOkResponse({ type: AdminUserPageDto })
  listUsers(@Query() query: AdminSearchDto): Promise<AdminUserPageDto> {
    return this.admin.listUsers(query);
  }

  @Post('users/:userId/disable')
  @HttpCode(HttpStatus.NO_CONTENT)
  @ApiNoContentResponse({ description: 'Cannot sign in any more; signed out everywhere' })
  disableUser(@CurrentUser() admin: SessionUser, @Param('userId', uuid('User')) userId: string): Promise<void> {
    return this.admin.setUserDisabled(admin, userId, true);
  }

  @Post('users/:userId/enable')
  @HttpCode(HttpStatus.NO_CONTENT)
  @ApiNoContentResponse()
  enableUser(@CurrentUser() admin: SessionUser, @Param('userId', uuid('User')) userId: string): Promise<void> {
    return this.admin.setUserDisabled(admin, userId, false);
  }

  @Get('workshops')
  @ApiOkResponse({ type: AdminWorkshopPageDto })
  listWorkshops(@Query() query: AdminSearchDto): Promise<AdminWorkshopPageDto> {
    return this.admin.listWorkshops(query);
  }

  @Post('workshops/:workshopId/disable')
  @HttpCode(HttpStatus.NO_CONTENT)
  @ApiNoContentResponse({ description: 'Members can still read it; nobody can change it' })
  disableWorkshop(@CurrentUser() admin: SessionUser, @Param('workshopId', uuid('Workshop')) workshopId: string): Promise<void> {
    return this.admin.setWorkshopDisabled(admin, workshopId, true);
  }

  @Post('workshops/:workshopId/enable')
  @HttpCode(HttpStatus.NO_CONTENT)
  @ApiNoContentResponse()
  enableWorkshop(@CurrentUser() admin: SessionUser, @Param('workshopId', uuid('Workshop')) workshopId: string): Promise<void> {
    return this.admin.setWorkshopDisabled(admin, workshopId, false);
  }
}
