import {
  BadRequestException,
  Body,
  Controller,
  Get,
  Header,
  Inject,
  Param,
  ParseUUIDPipe,
  Post,
  Put,
  Query,
  Res,
  UploadedFile,
} from '@nestjs/common';
import {
  ApiOkResponse,
  ApiProduces,
  ApiTags,
  ApiUnprocessableEntityResponse,
} from '@nestjs/swagger';
import type { Response } from 'express';
import { WorkshopEditor } from '../common/decorators/access.decorator';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import type { SessionUser } from '../common/types/access-context';
import {
  AttachTranscriptDto,
  AttachTranscriptFileDto,
  ExportQueryDto,
  FootageSearchResponseDto,
  HitMomentsQueryDto,
  HitMomentsResponseDto,
  SearchQueryDto,
  TranscriptDto,
  TranscriptQueryDto,
  TranscriptRevisionDto,
  WorkshopSearchResponseDto,
} from './dto/transcript.dto';
import { decodeTranscriptFile } from './transcript-text';
import { TRANSCRIPT_MAX_BYTES } from '../engine/transcript-limits';
import { SingleFileUpload } from '../common/uploads/single-file-upload.decorator';
import { TranscriptsService } from './transcripts.service';

interface UploadedTranscriptFile {
  buffer: Buffer;
  size: number;
  originalname: string;
}

/**
 * Transcripts of footage: attach (paste or file; a new revision each time), read, export as
 * WebVTT and search, within one footage or across the workshop. Editors only.
 */
@ApiTags('transcripts')
@WorkshopEditor()
@Controller('workshops/:workshopId')
export class TranscriptsController {
  constructor(@Inject(TranscriptsService) private readonly transcripts: TranscriptsService) {}

  @Get('footage/:footageId/transcript')
  @ApiOkResponse({ type: TranscriptDto, description: 'The active revision (or `?revision=N`) with its cues' })
  read(
    @Param('workshopId', ParseUUIDPipe) workshopId: string,
    @Param('footageId', ParseUUIDPipe) footageId: string,
    @Query() query: TranscriptQueryDto,
  ): Promise<TranscriptDto> {
    return this.transcripts.read(workshopId, footageId, query.revision);
  }

  @Put('footage/:footageId/transcript')
  @ApiOkResponse({ type: TranscriptDto, description: 'Stored as the new active revision; earlier revisions are kept' })
  @ApiUnprocessableEntityResponse({ description: '`{ statusCode, message, line }` naming the first bad line' })
  attach(
    @Param('workshopId', ParseUUIDPipe) workshopId: string,
    @Param('footageId', ParseUUIDPipe) footageId: string,
    @CurrentUser() user: SessionUser,
    @Body() body: AttachTranscriptDto,
  ): Promise<TranscriptDto> {
    return this.transcripts.attach(workshopId, footageId, user.id, { text: body.text, format: body.format });
  }

  @Post('footage/:footageId/transcript/file')
  @SingleFileUpload('file', {
    maxBytes: TRANSCRIPT_MAX_BYTES,
    what: 'The transcript file',
    expected: 'one transcript file',
    textFields: { format: { type: 'string', enum: ['auto', 'webvtt', 'srt', 'timestamped'] } },
  })
  @ApiOkResponse({ type: TranscriptDto, description: 'A .vtt, .srt or .txt file of at most 2 MB (UTF-8 or UTF-16 with BOM)' })
  @ApiUnprocessableEntityResponse({ description: '`{ statusCode, message, line }` naming the first bad line' })
  attachFile(
    @Param('workshopId', ParseUUIDPipe) workshopId: string,
    @Param('footageId', ParseUUIDPipe) footageId: string,
    @CurrentUser() user: SessionUser,
    @UploadedFile() file: UploadedTranscriptFile | undefined,
    @Body() body: AttachTranscriptFileDto,
  ): Promise<TranscriptDto> {
    if (!file || file.size === 0) throw new BadRequestException('Choose a transcript file (.vtt, .srt or .txt)');
    return this.transcripts.attach(workshopId, footageId, user.id, {
      text: decodeTranscriptFile(file.buffer),
      format: body.format,
      fileName: file.originalname,
    });
  }

  @Get('footage/:footageId/transcript/revisions')
  @ApiOkResponse({ type: [TranscriptRevisionDto], description: 'Newest first' })
  revisions(
    @Param('workshopId', ParseUUIDPipe) workshopId: string,
    @Param('footageId', ParseUUIDPipe) footageId: string,
  ): Promise<TranscriptRevisionDto[]> {
    return this.transcripts.revisions(workshopId, footageId);
  }

  @Get('footage/:footageId/transcript/webvtt')
  @Header('Cache-Control', 'no-store')
  @ApiProduces('text/vtt')
  @ApiOkResponse({ type: String, description: 'The transcript as a WebVTT file, for a `<track>` element or a download' })
  async exportWebVtt(
    @Param('workshopId', ParseUUIDPipe) workshopId: string,
    @Param('footageId', ParseUUIDPipe) footageId: string,
    @Query() query: ExportQueryDto,
    @Res({ passthrough: true }) response: Response,
  ): Promise<string> {
    const { fileName, body } = await this.transcripts.exportWebVtt(workshopId, footageId, query.revision);
    response.type('text/vtt; charset=utf-8');
    if (query.download) response.attachment(fileName);
    return body;
  }

  @Get('footage/:footageId/transcript/search')
  @ApiOkResponse({ type: FootageSearchResponseDto })
  searchFootage(
    @Param('workshopId', ParseUUIDPipe) workshopId: string,
    @Param('footageId', ParseUUIDPipe) footageId: string,
    @Query() query: SearchQueryDto,
  ): Promise<FootageSearchResponseDto> {
    return this.transcripts.searchFootage(workshopId, footageId, query);
  }

  @Get('footage/:footageId/transcript/search/moments')
  @ApiOkResponse({ type: HitMomentsResponseDto, description: 'Where every hit starts, for the density band on the marking timeline' })
  hitMoments(
    @Param('workshopId', ParseUUIDPipe) workshopId: string,
    @Param('footageId', ParseUUIDPipe) footageId: string,
    @Query() query: HitMomentsQueryDto,
  ): Promise<HitMomentsResponseDto> {
    return this.transcripts.hitMoments(workshopId, footageId, query.q);
  }

  @Get('transcripts/search')
  @ApiOkResponse({ type: WorkshopSearchResponseDto })
  searchWorkshop(
    @Param('workshopId', ParseUUIDPipe) workshopId: string,
    @Query() query: SearchQueryDto,
  ): Promise<WorkshopSearchResponseDto> {
    return this.transcripts.searchWorkshop(workshopId, query);
  }
}
