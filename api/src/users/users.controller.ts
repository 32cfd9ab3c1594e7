import { Body, Controller, Inject, Patch } from '@nestjs/common';
import { ApiOkResponse, ApiTags } from '@nestjs/swagger';
import { SignedIn } from '../common/decorators/access.decorator';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import type { SessionUser } from '../common/types/access-context';
import { UpdateProfileDto } from './dto/update-profile.dto';
import { SessionUserDto } from './dto/session-user.dto';
import { toSessionUser } from './users.mapper';
import { UsersService } from './users.service';

@ApiTags('account')
@Controller('users')
export class UsersController {
  constructor(@Inject(UsersService) private readonly usersService: UsersService) {}

  /** Display name and preferred units of the signed-in user. */
  @SignedIn()
  @Patch('me')
  @ApiOkResponse({ type: SessionUserDto })
  async updateProfile(@CurrentUser() user: SessionUser, @Body() changes: UpdateProfileDto): Promise<SessionUserDto> {
    return toSessionUser(await this.usersService.updateProfile(user.id, changes));
  }
}
