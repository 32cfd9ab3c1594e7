import { Body, Controller, Get, Inject, Param, ParseUUIDPipe, Post, Query } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import { WorkshopEditor } from '../common/decorators/access.decorator';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import type { SessionUser } from '../common/types/access-context';
import { AddEvidenceDto, CreateManualCheckDto, TransitionDto, WhatIfQueryDto } from './dto/fit-check.dto';
import { toEvidenceResponse, toFitCheckEventResponse, toFitCheckResponse } from './fit-check.mapper';
import { FitChecksService } from './fit-checks.service';

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
    return toEvidenceResponse(await this.fitChecks.addEvidence(workshopId, checkId, user.id, body));
  }

  @Get('checks/:checkId/history')
  async history(@Param('workshopId', ParseUUIDPipe) workshopId: string, @Param('checkId', ParseUUIDPipe) checkId: string) {
    return (await this.fitChecks.history(workshopId, checkId)).map(toFitCheckEventResponse);
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
