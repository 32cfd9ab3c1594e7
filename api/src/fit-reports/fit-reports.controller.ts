import { Body, Controller, Get, Inject, Param, ParseUUIDPipe, Patch, Post, Query, Redirect, UploadedFile } from '@nestjs/common';
import { ApiTags, ApiTooManyRequestsResponse } from '@nestjs/swagger';
import { SignedIn, WorkshopEditor } from '../common/decorators/access.decorator';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import type { SessionUser } from '../common/types/access-context';
import { SingleFileUpload } from '../common/uploads/single-file-upload.decorator';
import type { UploadedFileLike } from '../common/uploads/image-file';
import { CreateFitReportDto, FitReportsQueryDto, UpdateFitReportDto } from './dto/fit-report.dto';
import { FIT_REPORT_PHOTO_MAX_BYTES, FitReportsService } from './fit-reports.service';

/** Sending fit reports from a published guide, and the reporter's own list. */
@ApiTags('fit reports')
@SignedIn()
@Controller()
export class FitReportsController {
  constructor(@Inject(FitReportsService) private readonly reports: FitReportsService) {}

  @Post('guides/:workshopSlug/:guideSlug/fit-reports')
  @ApiTooManyRequestsResponse({ description: 'More than 10 reports from this person in the last hour' })
  create(
    @CurrentUser() user: SessionUser,
    @Param('workshopSlug') workshopSlug: string,
    @Param('guideSlug') guideSlug: string,
    @Body() body: CreateFitReportDto,
  ) {
    return this.reports.create(user.id, workshopSlug, guideSlug, body);
  }

  @Get('fit-reports')
  mine(@CurrentUser() user: SessionUser) {
    return this.reports.mine(user.id);
  }

  @Post('fit-reports/:reportId/photos')
  @SingleFileUpload('photo', { maxBytes: FIT_REPORT_PHOTO_MAX_BYTES, what: 'The photo', expected: 'one image' })
  addPhoto(
    @CurrentUser() user: SessionUser,
    @Param('reportId', ParseUUIDPipe) reportId: string,
    @UploadedFile() file: UploadedFileLike | undefined,
  ) {
    return this.reports.addPhoto(user.id, reportId, file);
  }

  @Get('fit-reports/:reportId/photos/:photoId')
  @Redirect()
  async photo(
    @CurrentUser() user: SessionUser,
    @Param('reportId', ParseUUIDPipe) reportId: string,
    @Param('photoId', ParseUUIDPipe) photoId: string,
  ) {
    return { url: await this.reports.photoUrlForReporter(user.id, reportId, photoId), statusCode: 302 };
  }
}

/** A workshop's inbox of fit reports. Editors and owners. */
@ApiTags('fit reports')
@WorkshopEditor()
@Controller('workshops/:workshopId/fit-reports')
export class WorkshopFitReportsController {
  constructor(@Inject(FitReportsService) private readonly reports: FitReportsService) {}

  @Get()
  list(@Param('workshopId', ParseUUIDPipe) workshopId: string, @Query() query: FitReportsQueryDto) {
    return this.reports.listForWorkshop(workshopId, query.status);
  }

  @Patch(':reportId')
  update(
    @Param('workshopId', ParseUUIDPipe) workshopId: string,
    @Param('reportId', ParseUUIDPipe) reportId: string,
    @Body() body: UpdateFitReportDto,
  ) {
    return this.reports.update(workshopId, reportId, body);
  }

  @Get(':reportId/photos/:photoId')
  @Redirect()
  async photo(
    @Param('workshopId', ParseUUIDPipe) workshopId: string,
    @Param('reportId', ParseUUIDPipe) reportId: string,
    @Param('photoId', ParseUUIDPipe) photoId: string,
  ) {
    return { url: await this.reports.photoUrlForWorkshop(workshopId, reportId, photoId), statusCode: 302 };
  }
}
