import { BadRequestException, Body, Controller, Delete, Get, HttpCode, Inject, Param, ParseUUIDPipe, Post, Query, Res } from '@nestjs/common';
import { ApiNoContentResponse, ApiNotFoundResponse, ApiOkResponse, ApiTags } from '@nestjs/swagger';
import type { Response } from 'express';
import { Public, SignedIn } from '../common/decorators/access.decorator';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import type { SessionUser } from '../common/types/access-context';
import { CreateFollowDto, UnsubscribeBodyDto, UnsubscribeQueryDto, UnsubscribeResultDto } from './dto/follow.dto';
import { FollowsService } from './follows.service';

/** What a signed-in person follows, and the e-mailed one-click way out. */
@ApiTags('follows')
@Controller('follows')
export class FollowsController {
  constructor(@Inject(FollowsService) private readonly follows: FollowsService) {}

  @Get()
  @SignedIn()
  list(@CurrentUser() user: SessionUser) {
    return this.follows.list(user.id);
  }

  @Post()
  @SignedIn()
  @ApiNotFoundResponse({ description: 'The target is neither in a published guide nor in one of your workshops' })
  async follow(@CurrentUser() user: SessionUser, @Body() body: CreateFollowDto, @Res({ passthrough: true }) response: Response) {
    const { follow, created } = await this.follows.follow(user.id, body.targetKind, body.targetId);
    response.status(created ? 201 : 200);
    return follow;
  }

  /** Declared before :followId routes; works without signing in (the e-mail's link, RFC 8058 one-click). */
  @Post('unsubscribe')
  @Public()
  @HttpCode(200)
  @ApiOkResponse({ type: UnsubscribeResultDto })
  @ApiNotFoundResponse({ description: 'Unknown token, or a followId this link cannot stop' })
  unsubscribe(@Query() query: UnsubscribeQueryDto, @Body() body: UnsubscribeBodyDto) {
    const token = query.token ?? body?.token;
    if (!token) throw new BadRequestException('The unsubscribe link is missing its token.');
    return this.follows.unsubscribe(token, body?.followId);
  }

  @Delete(':followId')
  @SignedIn()
  @HttpCode(204)
  @ApiNoContentResponse()
  async unfollow(@CurrentUser() user: SessionUser, @Param('followId', ParseUUIDPipe) followId: string): Promise<void> {
    await this.follows.unfollow(user.id, followId);
  }
}
