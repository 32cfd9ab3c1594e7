import { Inject, Injectable } from '@nestjs/common';
import { WaveformDto } from '../footage/dto/footage.dto';
import { FootageMediaService } from '../footage/footage-media.service';
import { publicGuidePath } from './guide.mapper';
import { PublishedGuidesService } from './published-guides.service';

/**
 * A published guide's footage renditions for anyone: the same playlists, thumbnails track and
 * waveform the studio gets, reached only while the guide is published (the lookup answers 404 after).
 */
@Injectable()
export class PublishedGuideMediaService {
  constructor(
    @Inject(PublishedGuidesService) private readonly published: PublishedGuidesService,
    @Inject(FootageMediaService) private readonly media: FootageMediaService,
  ) {}

  async master(workshopSlug: string, guideSlug: string): Promise<string> {
    const footage = await this.published.guideFootage(workshopSlug, guideSlug);
    return this.media.masterPlaylist(footage, { basePath: `/api${publicGuidePath(workshopSlug, guideSlug)}` });
  }

  async variant(workshopSlug: string, guideSlug: string, variant: string): Promise<string> {
    return this.media.variantPlaylist(await this.published.guideFootage(workshopSlug, guideSlug), variant);
  }

  async thumbnails(workshopSlug: string, guideSlug: string): Promise<string> {
    return this.media.thumbnails(await this.published.guideFootage(workshopSlug, guideSlug));
  }

  async waveform(workshopSlug: string, guideSlug: string): Promise<WaveformDto> {
    return this.media.waveform(await this.published.guideFootage(workshopSlug, guideSlug));
  }
}
