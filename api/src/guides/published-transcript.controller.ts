import { Controller, Get, Header, Inject, Param, Query } from '@nestjs/common';
import { ApiBadRequestResponse, ApiNotFoundResponse, ApiOkResponse, ApiTags } from '@nestjs/swagger';
import { Public } from '../common/decorators/access.decorator';
import { CueWindowQueryDto, CueWindowResponseDto } from '../transcripts/dto/transcript.dto';
import { PublishedGuidesService } from './published-guides.service';

/**
 * A published guide's transcript a window at a time: a three-hour transcript is 3,000 cues, and a reader's list
 * shows a screenful. Same for everyone, so shared caches may keep it a minute (as the captions file).
 */
@ApiTags('guides (public)')
@Public()
@Controller('guides')
export class PublishedTranscriptController {
  constructor(@Inject(PublishedGuidesService) private readonly published: PublishedGuidesService) {}

  @Get(':workshopSlug/:guideSlug/cues')
  @Header('Cache-Control', 'public, max-age=60')
  @ApiOkResponse({ type: CueWindowResponseDto, description: 'The cues in a stretch of time (fromMs, toMs) or of positions (fromIndex, limit)' })
  @ApiBadRequestResponse({ description: 'Neither or both pairs given, or toMs not after fromMs' })
  @ApiNotFoundResponse({ description: 'Not published, no footage, or no transcript' })
  cues(@Param('workshopSlug') workshopSlug: string, @Param('guideSlug') guideSlug: string, @Query() query: CueWindowQueryDto): Promise<CueWindowResponseDto> {
    return this.published.cueWindow(workshopSlug, guideSlug, query);
  }
}
