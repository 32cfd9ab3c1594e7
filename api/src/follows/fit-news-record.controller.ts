import { Controller, Get, HttpCode, Inject, Param, ParseUUIDPipe, Post } from '@nestjs/common';
import { ApiOkResponse, ApiTags } from '@nestjs/swagger';
import { WorkshopEditor, WorkshopOwner } from '../common/decorators/access.decorator';
import { CurrentMembership } from '../common/decorators/current-membership.decorator';
import type { WorkshopMembership } from '../common/types/access-context';
import { ChangeDeliveryRecordDto } from './dto/fit-news-record.dto';
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
