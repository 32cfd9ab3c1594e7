import { applyDecorators, Controller, Get, Header, Inject, Param, ParseUUIDPipe, Query, Redirect, Req, Res, StreamableFile, type Type } from '@nestjs/common';
import { ApiHeader, ApiNotFoundResponse, ApiOkResponse, ApiProduces, ApiQuery, ApiResponse, ApiTags } from '@nestjs/swagger';
import { ValidationError } from 'class-validator';
import type { Request, Response } from 'express';
import { Public } from '../common/decorators/access.decorator';
import { unlessNotModified } from '../common/http/entity-tag';
import { precompressedJson } from '../common/http/precompressed-json';
import { WaveformDto } from '../footage/dto/footage.dto';
import { validationException } from '../common/pipes/validation-errors';
import { PublishedGuideDto, PublishedGuideSummaryDto } from './dto/published-guide-response.dto';
import { PublishedGuideMediaService } from './published-guide-media.service';
import { PublishedGuidesService } from './published-guides.service';

/**
 * Shared caches may keep a public guide answer briefly and serve it a while longer while they ask again
 * with If-None-Match (RFC 5861), which costs one indexed query. The answers are the same for everyone,
 * signed in or not (following is done elsewhere), so the policy stands for signed-in readers too.
 */
export const PUBLIC_GUIDE_CACHE = 'public, max-age=30, stale-while-revalidate=300';

/** Playlists and the thumbnails track carry storage links valid an hour: caches may keep them a minute. */
const PUBLIC_MEDIA_CACHE = 'public, max-age=60';
const HLS_TYPE = 'application/vnd.apple.mpegurl';

function ConditionalPublicRead(what: string, type: Type<unknown> | [Type<unknown>]) {
  return applyDecorators(
    Header('Cache-Control', PUBLIC_GUIDE_CACHE),
    ApiHeader({ name: 'If-None-Match', required: false, description: `An ETag of ${what} from an earlier answer` }),
    ApiOkResponse({
      type,
      description: what,
      headers: {
        ETag: { description: 'Strong tag of the published revision and the live checklist it shows', schema: { type: 'string' } },
        'Cache-Control': { description: PUBLIC_GUIDE_CACHE, schema: { type: 'string' } },
      },
    }),
    ApiResponse({ status: 304, description: 'Unchanged since the ETag given in If-None-Match; no body' }),
  );
}

const MAX_SEARCH_LENGTH = 100;

/**
 * The index's one query field, checked by hand with the global pipes' rules and answer (400, `errors.q`, no other
 * fields): run before the entity tag, a class-validator pass cost more than the rest of a 304 from Redis.
 */
function indexSearch(query: Record<string, unknown>): string | undefined {
  const refuse = (property: string, constraints: Record<string, string>) => Object.assign(new ValidationError(), { property, constraints, children: [] });
  const errors = Object.keys(query)
    .filter((key) => key !== 'q')
    .map((key) => refuse(key, { whitelistValidation: `property ${key} should not exist` }));
  const { q } = query;
  if (q !== undefined && typeof q !== 'string') errors.push(refuse('q', { isString: 'q must be a string' }));
  else if (q !== undefined && q.length > MAX_SEARCH_LENGTH) {
    errors.push(refuse('q', { maxLength: `q must be shorter than or equal to ${MAX_SEARCH_LENGTH} characters` }));
  }
  if (errors.length > 0) throw validationException(errors);
  return q as string | undefined;
}

/** Published guides, for anyone: the index, the follow-along content and the guide's media. */
@ApiTags('guides (public)')
@Public()
@Controller('guides')
export class PublishedGuidesController {
  constructor(
    @Inject(PublishedGuidesService) private readonly published: PublishedGuidesService,
    @Inject(PublishedGuideMediaService) private readonly media: PublishedGuideMediaService,
  ) {}

  @Get()
  @ConditionalPublicRead('Published guides, newest first (at most 50)', [PublishedGuideSummaryDto])
  @ApiQuery({ name: 'q', required: false, type: String, description: 'Words of the title, build or workshop' })
  index(
    @Query() query: Record<string, unknown>,
    @Req() request: Request,
    @Res({ passthrough: true }) response: Response,
  ): Promise<PublishedGuideSummaryDto[] | StreamableFile | undefined> {
    const q = indexSearch(query);
    let tag = '';
    return unlessNotModified(
      request,
      response,
      async () => (tag = await this.published.indexTag()),
      async () => {
        // A search is built each time (any words can be asked); the plain index, which every reader opens, is held.
        if (q?.trim()) return this.published.index(q);
        const answer = await this.published.indexAnswer(tag);
        // The gzipped answer is what `index` built and stored as it was; `personal` is never the case here (no presigned links).
        return 'gzippedJson' in answer ? precompressedJson(request, response, answer.gzippedJson) : (answer.personal as PublishedGuideSummaryDto[]);
      },
    );
  }

  @Get(':workshopSlug/:guideSlug')
  @ConditionalPublicRead('The follow-along content: the published revision with the live verified-fit checklist', PublishedGuideDto)
  @ApiNotFoundResponse({ description: 'No such guide, or it is not published' })
  read(
    @Param('workshopSlug') workshopSlug: string,
    @Param('guideSlug') guideSlug: string,
    @Req() request: Request,
    @Res({ passthrough: true }) response: Response,
  ): Promise<PublishedGuideDto | StreamableFile | undefined> {
    // The gzipped answer is the same PublishedGuideDto, built by `read` and stored as it was.
    let tag: string | null = null;
    return unlessNotModified(
      request,
      response,
      async () => (tag = await this.published.readTag(workshopSlug, guideSlug)),
      async () => {
        if (tag === null) return this.published.read(workshopSlug, guideSlug);
        const answer = await this.published.readAnswer(workshopSlug, guideSlug, tag);
        // `personal` is what `read` built just now (checked against PublishedGuideDto on the line above), not shared.
        return 'gzippedJson' in answer ? precompressedJson(request, response, answer.gzippedJson) : (answer.personal as PublishedGuideDto);
      },
    );
  }

  /** Redirects to a short-lived storage link (seekable with HTTP Range), so a <video> can point here. */
  @Get(':workshopSlug/:guideSlug/video')
  @Redirect()
  @ApiResponse({ status: 302, description: 'Redirects to a short-lived link to the footage' })
  async video(@Param('workshopSlug') workshopSlug: string, @Param('guideSlug') guideSlug: string) {
    return { url: await this.published.videoUrl(workshopSlug, guideSlug), statusCode: 302 };
  }

  @Get(':workshopSlug/:guideSlug/poster')
  @Redirect()
  @ApiResponse({ status: 302, description: 'Redirects to a short-lived link to the poster image' })
  async poster(@Param('workshopSlug') workshopSlug: string, @Param('guideSlug') guideSlug: string) {
    return { url: await this.published.posterUrl(workshopSlug, guideSlug), statusCode: 302 };
  }

  /** A photo in the live checklist's evidence: redirects to a short-lived storage link, so an <img> can point here. */
  @Get(':workshopSlug/:guideSlug/evidence/:evidenceId/photo')
  @ApiResponse({ status: 302, description: 'Redirects to a short-lived link to the photo' })
  @ApiNotFoundResponse({ description: 'No such photo in the published guide’s live checklist' })
  @Redirect()
  async evidencePhoto(
    @Param('workshopSlug') workshopSlug: string,
    @Param('guideSlug') guideSlug: string,
    @Param('evidenceId', ParseUUIDPipe) evidenceId: string,
  ) {
    return { url: await this.published.evidencePhotoUrl(workshopSlug, guideSlug, evidenceId), statusCode: 302 };
  }

  @Get(':workshopSlug/:guideSlug/captions.vtt')
  @Header('Cache-Control', 'public, max-age=60')
  @ApiProduces('text/vtt')
  @ApiOkResponse({ type: String, description: "The guide's captions as a WebVTT file, for a `<track>` element" })
  async captions(
    @Param('workshopSlug') workshopSlug: string,
    @Param('guideSlug') guideSlug: string,
    @Res({ passthrough: true }) response: Response,
  ): Promise<string> {
    response.type('text/vtt; charset=utf-8');
    return this.published.captions(workshopSlug, guideSlug);
  }

  @Get(':workshopSlug/:guideSlug/hls/master.m3u8')
  @Header('Cache-Control', PUBLIC_MEDIA_CACHE)
  @ApiProduces(HLS_TYPE)
  @ApiOkResponse({ type: String, description: 'HLS master playlist of the guide’s footage; variant URIs are API paths' })
  @ApiNotFoundResponse({ description: 'Not published, no footage, or its web versions are not ready' })
  async hlsMaster(@Param('workshopSlug') workshopSlug: string, @Param('guideSlug') guideSlug: string, @Res({ passthrough: true }) response: Response) {
    response.type(HLS_TYPE);
    return this.media.master(workshopSlug, guideSlug);
  }

  @Get(':workshopSlug/:guideSlug/hls/:variant')
  @Header('Cache-Control', PUBLIC_MEDIA_CACHE)
  @ApiProduces(HLS_TYPE)
  @ApiOkResponse({ type: String, description: 'A rendition’s media playlist (`v0.m3u8` is the highest) with short-lived segment links' })
  @ApiNotFoundResponse({ description: 'Not published, no such rendition, or the web versions are not ready' })
  async hlsVariant(
    @Param('workshopSlug') workshopSlug: string,
    @Param('guideSlug') guideSlug: string,
    @Param('variant') variant: string,
    @Res({ passthrough: true }) response: Response,
  ) {
    response.type(HLS_TYPE);
    return this.media.variant(workshopSlug, guideSlug, variant);
  }

  @Get(':workshopSlug/:guideSlug/thumbnails.vtt')
  @Header('Cache-Control', PUBLIC_MEDIA_CACHE)
  @ApiProduces('text/vtt')
  @ApiOkResponse({ type: String, description: 'WebVTT thumbnails track: each cue is a sprite-sheet link with #xywh=x,y,w,h' })
  @ApiNotFoundResponse({ description: 'Not published, no footage, or its web versions are not ready' })
  async thumbnails(@Param('workshopSlug') workshopSlug: string, @Param('guideSlug') guideSlug: string, @Res({ passthrough: true }) response: Response) {
    response.type('text/vtt; charset=utf-8');
    return this.media.thumbnails(workshopSlug, guideSlug);
  }

  @Get(':workshopSlug/:guideSlug/waveform')
  @Header('Cache-Control', PUBLIC_MEDIA_CACHE)
  @ApiOkResponse({ type: WaveformDto, description: 'Audio peaks of the guide’s footage' })
  @ApiNotFoundResponse({ description: 'Not published, no footage, or its web versions are not ready' })
  waveform(@Param('workshopSlug') workshopSlug: string, @Param('guideSlug') guideSlug: string): Promise<WaveformDto> {
    return this.media.waveform(workshopSlug, guideSlug);
  }
}
