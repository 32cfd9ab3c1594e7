import { Controller, Get, Header, Inject, Param, Query, Redirect, Res } from '@nestjs/common';
import { ApiNotFoundResponse, ApiOkResponse, ApiProduces, ApiTags } from '@nestjs/swagger';
import type { Response } from 'express';
import { Public } from '../common/decorators/access.decorator';
import { PublicGuidesQueryDto } from './dto/guide.dto';
import { PublishedGuidesService } from './published-guides.service';

/** Published guides, for anyone: the index, the follow-along content and the guide's media. */
@ApiTags('guides (public)')
@Public()
@Controller('guides')
export class PublishedGuidesController {
  constructor(@Inject(PublishedGuidesService) private readonly published: PublishedGuidesService) {}

  @Get()
  @ApiOkResponse({ description: 'Published guides, newest first (at most 50)' })
  index(@Query() query: PublicGuidesQueryDto) {
    return this.published.index(query.q);
  }

  @Get(':workshopSlug/:guideSlug')
  @ApiNotFoundResponse({ description: 'No such guide, or it is not published' })
  read(@Param('workshopSlug') workshopSlug: string, @Param('guideSlug') guideSlug: string) {
    return this.published.read(workshopSlug, guideSlug);
  }

  /** Redirects to a short-lived storage link (seekable with HTTP Range), so a <video> can point here. */
  @Get(':workshopSlug/:guideSlug/video')
  @Redirect()
  async video(@Param('workshopSlug') workshopSlug: string, @Param('guideSlug') guideSlug: string) {
    return { url: await this.published.videoUrl(workshopSlug, guideSlug), statusCode: 302 };
  }

  @Get(':workshopSlug/:guideSlug/poster')
  @Redirect()
  async poster(@Param('workshopSlug') workshopSlug: string, @Param('guideSlug') guideSlug: string) {
    return { url: await this.published.posterUrl(workshopSlug, guideSlug), statusCode: 302 };
  }

  @Get(':workshopSlug/:guideSlug/captions.vtt')
  @Header('Cache-Control', 'public, max-age=60')
  @ApiProduces('text/vtt')
  async captions(
    @Param('workshopSlug') workshopSlug: string,
    @Param('guideSlug') guideSlug: string,
    @Res({ passthrough: true }) response: Response,
  ): Promise<string> {
    response.type('text/vtt; charset=utf-8');
    return this.published.captions(workshopSlug, guideSlug);
  }
}
