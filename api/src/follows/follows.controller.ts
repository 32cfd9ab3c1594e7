import { BadRequestException, Body, Controller, Delete, Get, HttpCode, Inject, Param, ParseUUIDPipe, Patch, Post, Put, Query, Res } from '@nestjs/common';
import { ApiCreatedResponse, ApiNoContentResponse, ApiNotFoundResponse, ApiOkResponse, ApiTags } from '@nestjs/swagger';
import type { Response } from 'express';
import { Public, SignedIn } from '../common/decorators/access.decorator';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import type { SessionUser } from '../common/types/access-context';
import { CreateFollowDto, UnsubscribeBodyDto, UnsubscribeQueryDto, UnsubscribeResultDto } from './dto/follow.dto';
import { FollowDeliveryDto, MailLinkQueryDto, MailPreferencesDto, UpdateMailPreferencesDto } from './dto/mail-preferences.dto';
import { FollowResponseDto } from './dto/follow-response.dto';
import { FollowsService } from './follows.service';
import { MailPreferencesService } from './mail-preferences.service';

/** What a signed-in person follows, and the e-mailed one-click way out. */
@ApiTags('follows')
@Controller('follows')
export class FollowsController {
  constructor(
    @Inject(FollowsService) private readonly follows: FollowsService,
    @Inject(MailPreferencesService) private readonly preferences: MailPreferencesService,
  ) {}

  @Get()
  @SignedIn()
  @ApiOkResponse({ type: [FollowResponseDto], description: "The caller's follows" })
  list(@CurrentUser() user: SessionUser): Promise<FollowResponseDto[]> {
    return this.follows.list(user.id);
  }

  @Post()
  @SignedIn()
  @ApiCreatedResponse({ type: FollowResponseDto, description: 'A new follow' })
  @ApiOkResponse({ type: FollowResponseDto, description: 'Already followed: the existing follow, unchanged' })
  @ApiNotFoundResponse({ description: 'The target is neither in a published guide nor in one of your workshops' })
  async follow(
    @CurrentUser() user: SessionUser,
    @Body() body: CreateFollowDto,
    @Res({ passthrough: true }) response: Response,
  ): Promise<FollowResponseDto> {
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
    return this.follows.unsubscribe(token, body?.followId, body?.scope);
  }

  @Get('preferences')
  @SignedIn()
  @ApiOkResponse({ type: MailPreferencesDto })
  getPreferences(@CurrentUser() user: SessionUser): Promise<MailPreferencesDto> {
    return this.preferences.get(user.id);
  }

  @Put('preferences')
  @SignedIn()
  @ApiOkResponse({ type: MailPreferencesDto })
  updatePreferences(@CurrentUser() user: SessionUser, @Body() body: UpdateMailPreferencesDto): Promise<MailPreferencesDto> {
    return this.preferences.update(user.id, body);
  }

  /** The preferences link in every fit-news mail and digest: works without signing in (the token is the key). */
  @Get('preferences/link')
  @Public()
  @ApiOkResponse({ type: MailPreferencesDto })
  @ApiNotFoundResponse({ description: 'Unknown token' })
  async getPreferencesByLink(@Query() query: MailLinkQueryDto): Promise<MailPreferencesDto> {
    return this.preferences.get(await this.preferences.userForLink(query.token));
  }

  @Put('preferences/link')
  @Public()
  @ApiOkResponse({ type: MailPreferencesDto })
  @ApiNotFoundResponse({ description: 'Unknown token' })
  async updatePreferencesByLink(@Query() query: MailLinkQueryDto, @Body() body: UpdateMailPreferencesDto): Promise<MailPreferencesDto> {
    return this.preferences.update(await this.preferences.userForLink(query.token), body);
  }

  @Patch(':followId')
  @SignedIn()
  @ApiOkResponse({ type: MailPreferencesDto })
  setDelivery(
    @CurrentUser() user: SessionUser,
    @Param('followId', ParseUUIDPipe) followId: string,
    @Body() body: FollowDeliveryDto,
  ): Promise<MailPreferencesDto> {
    return this.preferences.setDelivery(user.id, followId, body.delivery);
  }

  @Delete(':followId')
  @SignedIn()
  @HttpCode(204)
  @ApiNoContentResponse()
  async unfollow(@CurrentUser() user: SessionUser, @Param('followId', ParseUUIDPipe) followId: string): Promise<void> {
    await this.follows.unfollow(user.id, followId);
  }
}
