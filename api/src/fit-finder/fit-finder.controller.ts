import { Controller, Get, Inject, Query, UseGuards } from '@nestjs/common';
import { ApiBadRequestResponse, ApiOkResponse, ApiOperation, ApiTags, ApiTooManyRequestsResponse } from '@nestjs/swagger';
import { Public } from '../common/decorators/access.decorator';
import { ToolsThrottlerGuard } from '../tools/tools-throttler.guard';
import { FitFinderAnswerDto, FitFinderQueryDto } from './dto/fit-finder.dto';
import { FitFinderService } from './fit-finder.service';

/** "Has anyone proven this fits?" across every published guide; open to everyone and rate-limited like the calculators. */
@ApiTags('fit finder (public)')
@Public()
@UseGuards(ToolsThrottlerGuard)
@ApiTooManyRequestsResponse({ description: 'Too many requests from this address; wait a minute' })
@Controller('fit-finder')
export class FitFinderController {
  constructor(@Inject(FitFinderService) private readonly finder: FitFinderService) {}

  @Get()
  @ApiOperation({ summary: 'Published assemblies whose checks match what you have, confirmed first; near misses apart with the reason' })
  @ApiOkResponse({ type: FitFinderAnswerDto })
  @ApiBadRequestResponse({ description: 'Nothing to look for, or a field that cannot be read (named in the message)' })
  find(@Query() query: FitFinderQueryDto): Promise<FitFinderAnswerDto> {
    return this.finder.find(query);
  }
}
