import { Controller, Get, HttpCode, Inject, Param, ParseUUIDPipe, Post } from '@nestjs/common';
import { ApiNotFoundResponse, ApiOkResponse, ApiTags } from '@nestjs/swagger';
import { WorkshopEditor, WorkshopOwner } from '../common/decorators/access.decorator';
import { CurrentMembership } from '../common/decorators/current-membership.decorator';
import type { WorkshopMembership } from '../common/types/access-context';
import { BuildFitNewsRecordDto, ChangeDeliveryRecordDto } from './dto/fit-news-record.dto';
import { FitNewsRecordService } from './fit-news-record.service';

/** The creator's delivery record of a check's fit news, and a retry of failed mail (owners). */
@ApiTags('follows')
@Controller('workshops/:workshopId/checks/:checkId/fit-news')
export class FitNewsRecordController {
  constructor(@Inject(FitNewsRecordService) private readonly record: FitNewsRecordService) {}

  @Get()
  @WorkshopEditor()
  @ApiOkResponse({ type: [ChangeDeliveryRecordDto] })
  forCheck(@CurrentMembership() membership: WorkshopMembership, @Param('checkId', ParseUUIDPipe) checkId: string): Promise<ChangeDeliveryRecordDto[]> {
    return this.record.forCheck(membership.workshopId, checkId);
  }

  @Post('retry')
  @WorkshopOwner()
  @HttpCode(200)
  @ApiOkResponse({ type: [ChangeDeliveryRecordDto] })
  retry(@CurrentMembership() membership: WorkshopMembership, @Param('checkId', ParseUUIDPipe) checkId: string): Promise<ChangeDeliveryRecordDto[]> {
    return this.record.retryFailed(membership.workshopId, checkId);
  }
}

/** The build page's delivery record: the fit news of all the build's checks, and a retry of the failed ones (owners). */
@ApiTags('follows')
@Controller('workshops/:workshopId/builds/:buildId/fit-news')
export class BuildFitNewsRecordController {
  constructor(@Inject(FitNewsRecordService) private readonly record: FitNewsRecordService) {}

  @Get()
  @WorkshopEditor()
  @ApiOkResponse({ type: BuildFitNewsRecordDto })
  @ApiNotFoundResponse({ description: 'No such build in this workshop' })
  forBuild(@CurrentMembership() membership: WorkshopMembership, @Param('buildId', ParseUUIDPipe) buildId: string): Promise<BuildFitNewsRecordDto> {
    return this.record.forBuild(membership.workshopId, buildId);
  }

  @Post('retry')
  @WorkshopOwner()
  @HttpCode(200)
  @ApiOkResponse({ type: BuildFitNewsRecordDto })
  @ApiNotFoundResponse({ description: 'No such build in this workshop' })
  retry(@CurrentMembership() membership: WorkshopMembership, @Param('buildId', ParseUUIDPipe) buildId: string): Promise<BuildFitNewsRecordDto> {
    return this.record.retryFailedForBuild(membership.workshopId, buildId);
  }
}
