import { Body, Controller, Delete, Get, HttpCode, Inject, Param, ParseIntPipe, ParseUUIDPipe, Patch, Post, Put } from '@nestjs/common';
import {
  ApiBadRequestResponse,
  ApiConflictResponse,
  ApiCreatedResponse,
  ApiNoContentResponse,
  ApiOkResponse,
  ApiServiceUnavailableResponse,
  ApiTags,
  ApiUnprocessableEntityResponse,
} from '@nestjs/swagger';
import { WorkshopEditor } from '../common/decorators/access.decorator';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import type { SessionUser } from '../common/types/access-context';
import {
  CreateFootageDto,
  CreateFootageResponseDto,
  FootageLimitsDto,
  FootageResponseDto,
  PartUrlsRequestDto,
  PartUrlsResponseDto,
  PlaybackResponseDto,
  RecordPartDto,
  RecordPartResponseDto,
  UpdateFootageDto,
  UploadStateDto,
} from './dto/footage.dto';
import { FootageService } from './footage.service';

/**
 * A build's footage and its resumable upload. The browser uploads parts straight to storage with
 * presigned URLs; the API only plans, signs, records and completes. Editors only; footage of a
 * workshop is never reachable through another workshop's id.
 */
@ApiTags('footage')
@WorkshopEditor()
@Controller('workshops/:workshopId')
export class FootageController {
  constructor(@Inject(FootageService) private readonly footage: FootageService) {}

  @Get('footage-limits')
  @ApiOkResponse({ type: FootageLimitsDto, description: 'Accepted file types and sizes, for checks before any byte is sent' })
  limits(): FootageLimitsDto {
    return this.footage.limits();
  }

  @Get('builds/:buildId/footage')
  @ApiOkResponse({ type: [FootageResponseDto] })
  list(
    @Param('workshopId', ParseUUIDPipe) workshopId: string,
    @Param('buildId', ParseUUIDPipe) buildId: string,
  ): Promise<FootageResponseDto[]> {
    return this.footage.list(workshopId, buildId);
  }

  @Post('builds/:buildId/footage')
  @ApiCreatedResponse({ type: CreateFootageResponseDto, description: 'Footage in state "uploading" and its part plan' })
  @ApiServiceUnavailableResponse({ description: 'Storage is not answering (`code: storage_unavailable`); try again' })
  create(
    @Param('workshopId', ParseUUIDPipe) workshopId: string,
    @Param('buildId', ParseUUIDPipe) buildId: string,
    @CurrentUser() user: SessionUser,
    @Body() body: CreateFootageDto,
  ): Promise<CreateFootageResponseDto> {
    return this.footage.create(workshopId, buildId, user.id, body);
  }

  @Get('footage/:footageId')
  @ApiOkResponse({ type: FootageResponseDto })
  async get(
    @Param('workshopId', ParseUUIDPipe) workshopId: string,
    @Param('footageId', ParseUUIDPipe) footageId: string,
  ): Promise<FootageResponseDto> {
    return this.footage.describe(await this.footage.get(workshopId, footageId));
  }

  @Patch('footage/:footageId')
  @ApiOkResponse({ type: FootageResponseDto })
  rename(
    @Param('workshopId', ParseUUIDPipe) workshopId: string,
    @Param('footageId', ParseUUIDPipe) footageId: string,
    @Body() body: UpdateFootageDto,
  ): Promise<FootageResponseDto> {
    return this.footage.rename(workshopId, footageId, body.title);
  }

  @Delete('footage/:footageId')
  @HttpCode(204)
  @ApiNoContentResponse({ description: 'Deleted with its stored file, poster and transcripts' })
  async remove(
    @Param('workshopId', ParseUUIDPipe) workshopId: string,
    @Param('footageId', ParseUUIDPipe) footageId: string,
  ): Promise<void> {
    await this.footage.remove(workshopId, footageId);
  }

  @Get('footage/:footageId/playback')
  @ApiOkResponse({ type: PlaybackResponseDto, description: 'A short-lived link to the video (HTTP Range works for seeking)' })
  @ApiConflictResponse({ description: 'The footage is not ready' })
  playback(
    @Param('workshopId', ParseUUIDPipe) workshopId: string,
    @Param('footageId', ParseUUIDPipe) footageId: string,
  ): Promise<PlaybackResponseDto> {
    return this.footage.playback(workshopId, footageId);
  }

  @Get('footage/:footageId/upload')
  @ApiOkResponse({ type: UploadStateDto, description: 'The part plan and the finished parts, to resume an upload' })
  @ApiConflictResponse({ description: 'The upload is already finished' })
  uploadState(
    @Param('workshopId', ParseUUIDPipe) workshopId: string,
    @Param('footageId', ParseUUIDPipe) footageId: string,
  ): Promise<UploadStateDto> {
    return this.footage.getUploadState(workshopId, footageId);
  }

  @Post('footage/:footageId/upload/part-urls')
  @HttpCode(200)
  @ApiOkResponse({ type: PartUrlsResponseDto, description: 'Presigned PUT URLs, valid for 15 minutes' })
  signPartUrls(
    @Param('workshopId', ParseUUIDPipe) workshopId: string,
    @Param('footageId', ParseUUIDPipe) footageId: string,
    @Body() body: PartUrlsRequestDto,
  ): Promise<PartUrlsResponseDto> {
    return this.footage.signPartUrls(workshopId, footageId, body.partNumbers);
  }

  @Put('footage/:footageId/upload/parts/:partNumber')
  @ApiOkResponse({ type: RecordPartResponseDto, description: 'The part is recorded as finished' })
  @ApiBadRequestResponse({ description: 'The part number is outside the plan, or the ETag is not one storage gives a part' })
  recordPart(
    @Param('workshopId', ParseUUIDPipe) workshopId: string,
    @Param('footageId', ParseUUIDPipe) footageId: string,
    @Param('partNumber', ParseIntPipe) partNumber: number,
    @Body() body: RecordPartDto,
  ): Promise<RecordPartResponseDto> {
    return this.footage.recordPart(workshopId, footageId, partNumber, body.etag);
  }

  @Post('footage/:footageId/upload/complete')
  @HttpCode(200)
  @ApiOkResponse({ type: FootageResponseDto, description: 'Assembled; the footage is now processing' })
  @ApiConflictResponse({ description: 'Parts are missing (listed in `missingParts`), or storage no longer has the upload' })
  @ApiUnprocessableEntityResponse({
    description: 'Storage does not hold a recorded part as recorded (`invalidParts`); that record is dropped: upload the part again',
  })
  @ApiServiceUnavailableResponse({ description: 'Storage is not answering (`code: storage_unavailable`); the upload is kept, try again' })
  complete(
    @Param('workshopId', ParseUUIDPipe) workshopId: string,
    @Param('footageId', ParseUUIDPipe) footageId: string,
  ): Promise<FootageResponseDto> {
    return this.footage.complete(workshopId, footageId);
  }

  @Delete('footage/:footageId/upload')
  @HttpCode(204)
  @ApiNoContentResponse({ description: 'The multipart upload is cancelled and the footage deleted' })
  async abort(
    @Param('workshopId', ParseUUIDPipe) workshopId: string,
    @Param('footageId', ParseUUIDPipe) footageId: string,
  ): Promise<void> {
    await this.footage.abort(workshopId, footageId);
  }
}
