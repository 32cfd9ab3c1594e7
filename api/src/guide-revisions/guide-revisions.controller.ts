import { Controller, Get, Header, HttpCode, Inject, Param, Put, Query } from '@nestjs/common';
import { ApiBadRequestResponse, ApiNotFoundResponse, ApiOkResponse, ApiTags } from '@nestjs/swagger';
import { Public, SignedIn } from '../common/decorators/access.decorator';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import type { SessionUser } from '../common/types/access-context';
import {
  GuideReadingDto,
  PublicRevisionDto,
  PublicRevisionListDto,
  PublishedGuideParamsDto,
  PublishedRevisionParamsDto,
  RevisionCompareDto,
  RevisionCompareQueryDto,
} from './dto/guide-revisions.dto';
import { GuideRevisionsService } from './guide-revisions.service';

/** Published revisions stay as they were, but a withdrawal must close them soon: caches may keep them a short while. */
const REVISION_CACHE = 'public, max-age=30';

/**
 * A published guide's earlier revisions and their comparison, for anyone; and, apart from the shared (cached)
 * follow-along answer, the signed-in reader's own "last opened" record (never cached: `no-store`).
 */
@ApiTags('guides (public)')
@Controller('guides/:workshopSlug/:guideSlug')
export class GuideRevisionsController {
  constructor(@Inject(GuideRevisionsService) private readonly revisions: GuideRevisionsService) {}

  @Public()
  @Get('revisions')
  @Header('Cache-Control', REVISION_CACHE)
  @ApiOkResponse({ type: PublicRevisionListDto })
  @ApiNotFoundResponse({ description: 'No such guide, or it is not published' })
  list(@Param() params: PublishedGuideParamsDto): Promise<PublicRevisionListDto> {
    return this.revisions.list(params.workshopSlug, params.guideSlug);
  }

  /** Declared before revisions/:number so "compare" is not read as a number. */
  @Public()
  @Get('revisions/compare')
  @Header('Cache-Control', REVISION_CACHE)
  @ApiOkResponse({ type: RevisionCompareDto })
  @ApiBadRequestResponse({ description: 'from or to missing or not a whole number' })
  @ApiNotFoundResponse({ description: 'The guide is not published, or it has no such revision (errors names from or to)' })
  compare(@Param() params: PublishedGuideParamsDto, @Query() query: RevisionCompareQueryDto): Promise<RevisionCompareDto> {
    return this.revisions.compare(params.workshopSlug, params.guideSlug, query.from, query.to);
  }

  @Public()
  @Get('revisions/:number')
  @Header('Cache-Control', REVISION_CACHE)
  @ApiOkResponse({ type: PublicRevisionDto, description: 'The revision as published, read-only, with the checklist as it stood then' })
  @ApiBadRequestResponse({ description: 'number is not a whole number from 1' })
  @ApiNotFoundResponse({ description: 'The guide is not published, or it has no such revision' })
  revision(@Param() params: PublishedRevisionParamsDto): Promise<PublicRevisionDto> {
    return this.revisions.revision(params.workshopSlug, params.guideSlug, params.number);
  }

  @SignedIn()
  @Get('reading')
  @ApiOkResponse({ type: GuideReadingDto, description: 'The revision this reader last opened, beside the current one' })
  @ApiNotFoundResponse({ description: 'No such guide, or it is not published' })
  reading(@CurrentUser() user: SessionUser, @Param() params: PublishedGuideParamsDto): Promise<GuideReadingDto> {
    return this.revisions.reading(user.id, params.workshopSlug, params.guideSlug);
  }

  @SignedIn()
  @Put('reading')
  @HttpCode(200)
  @ApiOkResponse({ type: GuideReadingDto, description: 'Recorded: this reader has opened the current revision' })
  @ApiNotFoundResponse({ description: 'No such guide, or it is not published' })
  recordReading(@CurrentUser() user: SessionUser, @Param() params: PublishedGuideParamsDto): Promise<GuideReadingDto> {
    return this.revisions.recordReading(user.id, params.workshopSlug, params.guideSlug);
  }
}
