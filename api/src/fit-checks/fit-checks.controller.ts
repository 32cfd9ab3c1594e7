import { Body, Controller, Get, Inject, Param, ParseUUIDPipe, Post, Query, Redirect, UploadedFile } from '@nestjs/common';
import { ApiConflictResponse, ApiTags } from '@nestjs/swagger';
import { WorkshopEditor } from '../common/decorators/access.decorator';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import type { SessionUser } from '../common/types/access-context';
import { AddEvidenceDto, CreateManualCheckDto, PhotoEvidenceDto, TransitionDto, WhatIfQueryDto } from './dto/fit-check.dto';
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
  async checklist(
    @Param('workshopId', ParseUUIDPipe) workshopId: string,
    @Param('assemblyId', ParseUUIDPipe) assemblyId: string,
  ) {
    const { verdict, items } = await this.fitChecks.checklist(workshopId, assemblyId);
    return { verdict, checks: items.map(({ check, evidence }) => toFitCheckResponse(check, evidence)) };
  }

  @Post('assemblies/:assemblyId/checks')
  async createManual(
    @Param('workshopId', ParseUUIDPipe) workshopId: string,
    @Param('assemblyId', ParseUUIDPipe) assemblyId: string,
    @CurrentUser() user: SessionUser,
    @Body() body: CreateManualCheckDto,
  ) {
    return toFitCheckResponse(await this.fitChecks.createManual(workshopId, assemblyId, user.id, body));
  }

  @Post('checks/:checkId/transitions')
  @ApiConflictResponse({
    description:
      'Refused, nothing stored: `already_in_state` (a repeat, e.g. a double click; `state` is the state now), `state_changed` (not in `from` any more) or `transition_refused` (the rules forbid it)',
  })
  async transition(
    @Param('workshopId', ParseUUIDPipe) workshopId: string,
    @Param('checkId', ParseUUIDPipe) checkId: string,
    @CurrentUser() user: SessionUser,
    @Body() body: TransitionDto,
  ) {
    return toFitCheckResponse(await this.fitChecks.transition(workshopId, checkId, user.id, body));
  }

  @Post('checks/:checkId/evidence')
  async addEvidence(
    @Param('workshopId', ParseUUIDPipe) workshopId: string,
    @Param('checkId', ParseUUIDPipe) checkId: string,
    @CurrentUser() user: SessionUser,
    @Body() body: AddEvidenceDto,
  ) {
    return toEvidenceResponse(await this.fitChecks.addEvidence(workshopId, checkId, user.id, body), workshopId);
  }

  @Post('checks/:checkId/photos')
  @SingleFileUpload('photo', { maxBytes: EVIDENCE_PHOTO_MAX_BYTES, what: 'The photo', expected: 'one image' })
  async addPhotoEvidence(
    @Param('workshopId', ParseUUIDPipe) workshopId: string,
    @Param('checkId', ParseUUIDPipe) checkId: string,
    @CurrentUser() user: SessionUser,
    @UploadedFile() file: UploadedFileLike | undefined,
    @Body() body: PhotoEvidenceDto,
  ) {
    return toEvidenceResponse(await this.fitChecks.addPhotoEvidence(workshopId, checkId, user.id, file, body.note ?? ''), workshopId);
  }

  /** Redirects to a short-lived storage link, so an <img> can point here. */
  @Get('checks/:checkId/evidence/:evidenceId/photo')
  @Redirect()
  async evidencePhoto(
    @Param('workshopId', ParseUUIDPipe) workshopId: string,
    @Param('checkId', ParseUUIDPipe) checkId: string,
    @Param('evidenceId', ParseUUIDPipe) evidenceId: string,
  ) {
    return { url: await this.fitChecks.evidencePhotoUrl(workshopId, checkId, evidenceId), statusCode: 302 };
  }

  @Get('checks/:checkId/history')
  async history(@Param('workshopId', ParseUUIDPipe) workshopId: string, @Param('checkId', ParseUUIDPipe) checkId: string) {
    const { events, actorNames } = await this.fitChecks.history(workshopId, checkId);
    return events.map((event) => toFitCheckEventResponse(event, actorNames));
  }

  @Get('interfaces/:interfaceId/what-if')
  whatIf(
    @Param('workshopId', ParseUUIDPipe) workshopId: string,
    @Param('interfaceId', ParseUUIDPipe) interfaceId: string,
    @Query() query: WhatIfQueryDto,
  ) {
    return this.fitChecks.whatIf(workshopId, interfaceId, query.delta, query.unit);
  }
}
