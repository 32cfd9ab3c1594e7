import { Controller, Get, Inject, Query, UseGuards } from '@nestjs/common';
import { ApiBadRequestResponse, ApiOkResponse, ApiOperation, ApiTags, ApiTooManyRequestsResponse } from '@nestjs/swagger';
import { Public } from '../common/decorators/access.decorator';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import type { SessionUser } from '../common/types/access-context';
import { ToolsThrottlerGuard } from '../tools/tools-throttler.guard';
import { SearchQueryDto, SearchResultsDto } from './dto/search.dto';
import { SearchService } from './search.service';

/** One search box: published guides for everyone, and a member's own workshops when signed in. Rate-limited like the calculators. */
@ApiTags('search')
@Public()
@UseGuards(ToolsThrottlerGuard)
@ApiTooManyRequestsResponse({ description: 'Too many requests from this address; wait a minute' })
@Controller('search')
export class SearchController {
  constructor(@Inject(SearchService) private readonly searchService: SearchService) {}

  @Get()
  @ApiOperation({ summary: 'Search published guides (titles, steps, parts, part numbers, transcript cues) and, signed in, your workshops' })
  @ApiOkResponse({ type: SearchResultsDto })
  @ApiBadRequestResponse({ description: 'A filter out of range, or a query with nothing to search for; the message names the field' })
  search(@Query() query: SearchQueryDto, @CurrentUser({ optional: true }) user: SessionUser | undefined): Promise<SearchResultsDto> {
    return this.searchService.search(query, user);
  }
}
