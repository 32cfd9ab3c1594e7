import { Body, Controller, Get, Inject, Param, ParseUUIDPipe, Post, Query, Redirect, UploadedFile } from '@nestjs/common';
import { ApiConflictResponse, ApiCreatedResponse, ApiFoundResponse, ApiOkResponse, ApiTags } from '@nestjs/swagger';
import { WorkshopEditor } from '../common/decorators/access.decorator';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import type { SessionUser } from '../common/types/access-context';
import { AddEvidenceDto, CreateManualCheckDto, PhotoEvidenceDto, TransitionDto, WhatIfQueryDto } from './dto/fit-check.dto';
import {
  ChecklistResponseDto,
  EvidenceResponseDto,
  FitCheckEventResponseDto,
  FitCheckResponseDto,
  WhatIfResponseDto,
} from './dto/fit-check-response.dto';
import { toEvidenceResponse, toFitCheckEventResponse, toFitCheckResponse } from './fit-check.mapper';
import { EVIDENCE_PHOTO_MAX_BYTES, FitChecksService } from './fit-checks.service';
import { SingleFileUpload } from '../common/uploads/single-file-upload.decorator';
import type { UploadedFileLike } from '../common/uploads/image-file';

@ApiTags('fit checks')
@WorkshopEditor()
@Controller('workshops/:workshopId')
export class FitChecksController {
  constructor(@Inject(FitChecksService) private readonly fitChecks: FitChecksService) {}

  /** The verified-fit checklist of an assembly and its roll-up verdict. */
  @Get('assemblies/:assemblyId/checklist')
  @ApiOkResponse({ type: ChecklistResponseDto })
  async checklist(
    @Param('workshopId', ParseUUIDPipe) workshopId: string,
    @Param('assemblyId', ParseUUIDPipe) assemblyId: string,
  ): Promise<ChecklistResponseDto> {
    const { verdict, items } = await this.fitChecks.checklist(workshopId, assemblyId);
    return { verdict, checks: items.map(({ check, evidence }) => toFitCheckResponse(check, evidence)) };
  }

  @Post('assemblies/:assemblyId/checks')
  @ApiCreatedResponse({ type: FitCheckResponseDto })
  async createManual(
    @Param('workshopId', ParseUUIDPipe) workshopId: string,
    @Param('assemblyId', ParseUUIDPipe) assemblyId: string,
    @CurrentUser() user: SessionUser,
    @Body() body: CreateManualCheckDto,
  ): Promise<FitCheckResponseDto> {
    return toFitCheckResponse(await this.fitChecks.createManual(workshopId, assemblyId, user.id, body));
  }

  @Post('checks/:checkId/transitions')
  @ApiCreatedResponse({ type: FitCheckResponseDto, description: 'The check in its new state' })
  @ApiConflictResponse({
    description:
      'Refused, nothing stored: `already_in_state` (a repeat, e.g. a double click; `state` is the state now), `state_changed` (not in `from` any more) or `transition_refused` (the rules forbid it)',
  })
  async transition(
    @Param('workshopId', ParseUUIDPipe) workshopId: string,
    @Param('checkId', ParseUUIDPipe) checkId: string,
    @CurrentUser() user: SessionUser,
    @Body() body: TransitionDto,
  ): Promise<FitCheckResponseDto> {
    return toFitCheckResponse(await this.fitChecks.transition(workshopId, checkId, user.id, body));
  }

  @Post('checks/:checkId/evidence')
  @ApiCreatedResponse({ type: EvidenceResponseDto })
  async addEvidence(
    @Param('workshopId', ParseUUIDPipe) workshopId: string,
    @Param('checkId', ParseUUIDPipe) checkId: string,
    @CurrentUser() user: SessionUser,
    @Body() body: AddEvidenceDto,
  ): Promise<EvidenceResponseDto> {
    return toEvidenceResponse(await this.fitChecks.addEvidence(workshopId, checkId, user.id, body), workshopId);
  }

  @Post('checks/:checkId/photos')
  @SingleFileUpload('photo', { maxBytes: EVIDENCE_PHOTO_MAX_BYTES, what: 'The photo', expected: 'one image' })
  @ApiCreatedResponse({ type: EvidenceResponseDto })
  async addPhotoEvidence(
    @Param('workshopId', ParseUUIDPipe) workshopId: string,
    @Param('checkId', ParseUUIDPipe) checkId: string,
    @CurrentUser() user: SessionUser,
    @UploadedFile() file: UploadedFileLike | undefined,
    @Body() body: PhotoEvidenceDto,
  ): Promise<EvidenceResponseDto> {
    return toEvidenceResponse(await this.fitChecks.addPhotoEvidence(workshopId, checkId, user.id, file, body.note ?? ''), workshopId);
  }

  /** Redirects to a short-lived storage link, so an <img> can point here. */
  @Get('checks/:checkId/evidence/:evidenceId/photo')
  @Redirect()
  @ApiFoundResponse({ description: 'Redirects to a short-lived link to the photo' })
  async evidencePhoto(
    @Param('workshopId', ParseUUIDPipe) workshopId: string,
    @Param('checkId', ParseUUIDPipe) checkId: string,
    @Param('evidenceId', ParseUUIDPipe) evidenceId: string,
  ) {
    return { url: await this.fitChecks.evidencePhotoUrl(workshopId, checkId, evidenceId), statusCode: 302 };
  }

  @Get('checks/:checkId/history')
  @ApiOkResponse({ type: [FitCheckEventResponseDto], description: 'Oldest first' })
  async history(@Param('workshopId', ParseUUIDPipe) workshopId: string, @Param('checkId', ParseUUIDPipe) checkId: string): Promise<FitCheckEventResponseDto[]> {
    const { events, actorNames } = await this.fitChecks.history(workshopId, checkId);
    return events.map((event) => toFitCheckEventResponse(event, actorNames));
  }

  @Get('interfaces/:interfaceId/what-if')
  @ApiOkResponse({ type: WhatIfResponseDto })
  whatIf(
    @Param('workshopId', ParseUUIDPipe) workshopId: string,
    @Param('interfaceId', ParseUUIDPipe) interfaceId: string,
    @Query() query: WhatIfQueryDto,
  ): Promise<WhatIfResponseDto> {
    return this.fitChecks.whatIf(workshopId, interfaceId, query.delta, query.unit);
  }
}
