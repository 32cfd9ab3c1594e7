import { Body, Controller, Get, Header, HttpCode, Inject, Param, ParseUUIDPipe, Post, Put } from '@nestjs/common';
import { ApiConflictResponse, ApiNotFoundResponse, ApiOkResponse, ApiProduces, ApiTags } from '@nestjs/swagger';
import { WorkshopEditor, WorkshopOwner } from '../common/decorators/access.decorator';
import { FootageResponseDto, MediaSettingsDto, WaveformDto } from './dto/footage.dto';
import { FootageMediaService } from './footage-media.service';
import { FootageService } from './footage.service';

const HLS_TYPE = 'application/vnd.apple.mpegurl';

/**
 * A footage's web renditions for the studio's players: HLS playlists served through the API (segment
 * links inside are short-lived, the bucket stays private), the scrub-preview track and the waveform;
 * the retry of a failed transcode; the workshop's keep/drop-originals setting.
 */
@ApiTags('footage')
@Controller('workshops/:workshopId')
export class FootageMediaController {
  constructor(
    @Inject(FootageService) private readonly footage: FootageService,
    @Inject(FootageMediaService) private readonly media: FootageMediaService,
  ) {}

  @WorkshopEditor()
  @Get('footage/:footageId/hls/master.m3u8')
  @Header('Content-Type', HLS_TYPE)
  @Header('Cache-Control', 'private, no-store')
  @ApiProduces(HLS_TYPE)
  @ApiOkResponse({ type: String, description: 'HLS master playlist; variant URIs are API paths' })
  @ApiNotFoundResponse({ description: 'No such footage, or its web versions are not ready' })
  async master(
    @Param('workshopId', ParseUUIDPipe) workshopId: string,
    @Param('footageId', ParseUUIDPipe) footageId: string,
  ): Promise<string> {
    return this.media.masterPlaylist(await this.footage.get(workshopId, footageId), { basePath: `/api/workshops/${workshopId}/footage/${footageId}` });
  }

  @WorkshopEditor()
  @Get('footage/:footageId/hls/:variant')
  @Header('Content-Type', HLS_TYPE)
  @Header('Cache-Control', 'private, no-store')
  @ApiProduces(HLS_TYPE)
  @ApiOkResponse({ type: String, description: 'A rendition’s media playlist (`v0.m3u8` is the highest) with short-lived segment links' })
  @ApiNotFoundResponse({ description: 'No such footage or rendition, or the web versions are not ready' })
  async variant(
    @Param('workshopId', ParseUUIDPipe) workshopId: string,
    @Param('footageId', ParseUUIDPipe) footageId: string,
    @Param('variant') variant: string,
  ): Promise<string> {
    return this.media.variantPlaylist(await this.footage.get(workshopId, footageId), variant);
  }

  @WorkshopEditor()
  @Get('footage/:footageId/thumbnails.vtt')
  @Header('Content-Type', 'text/vtt; charset=utf-8')
  @Header('Cache-Control', 'private, no-store')
  @ApiProduces('text/vtt')
  @ApiOkResponse({ type: String, description: 'WebVTT thumbnails track: each cue is a sprite-sheet link with #xywh=x,y,w,h' })
  @ApiNotFoundResponse({ description: 'No such footage, or its web versions are not ready' })
  async thumbnails(
    @Param('workshopId', ParseUUIDPipe) workshopId: string,
    @Param('footageId', ParseUUIDPipe) footageId: string,
  ): Promise<string> {
    return this.media.thumbnails(await this.footage.get(workshopId, footageId));
  }

  @WorkshopEditor()
  @Get('footage/:footageId/waveform')
  @ApiOkResponse({ type: WaveformDto, description: 'Audio peaks for drawing under the timeline' })
  @ApiNotFoundResponse({ description: 'No such footage, or its web versions are not ready' })
  async waveform(
    @Param('workshopId', ParseUUIDPipe) workshopId: string,
    @Param('footageId', ParseUUIDPipe) footageId: string,
  ): Promise<WaveformDto> {
    return this.media.waveform(await this.footage.get(workshopId, footageId));
  }

  @WorkshopEditor()
  @Post('footage/:footageId/renditions/retry')
  @HttpCode(200)
  @ApiOkResponse({ type: FootageResponseDto, description: 'Queued again; earlier outputs are replaced, never doubled' })
  @ApiConflictResponse({ description: 'Not ready yet, already being made, or the original was dropped' })
  retry(
    @Param('workshopId', ParseUUIDPipe) workshopId: string,
    @Param('footageId', ParseUUIDPipe) footageId: string,
  ): Promise<FootageResponseDto> {
    return this.footage.retryRenditions(workshopId, footageId);
  }

  @WorkshopEditor()
  @Get('media-settings')
  @ApiOkResponse({ type: MediaSettingsDto })
  settings(@Param('workshopId', ParseUUIDPipe) workshopId: string): Promise<MediaSettingsDto> {
    return this.footage.mediaSettings(workshopId);
  }

  @WorkshopOwner()
  @Put('media-settings')
  @ApiOkResponse({ type: MediaSettingsDto, description: 'Applies to footage transcoded from now on' })
  updateSettings(@Param('workshopId', ParseUUIDPipe) workshopId: string, @Body() body: MediaSettingsDto): Promise<MediaSettingsDto> {
    return this.footage.updateMediaSettings(workshopId, body.keepOriginals);
  }
}
