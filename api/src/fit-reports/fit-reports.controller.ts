import { Body, Controller, Get, Inject, Param, ParseUUIDPipe, Patch, Post, Query, Redirect, UploadedFile } from '@nestjs/common';
import { ApiCreatedResponse, ApiFoundResponse, ApiOkResponse, ApiTags, ApiTooManyRequestsResponse } from '@nestjs/swagger';
import { SignedIn, WorkshopEditor } from '../common/decorators/access.decorator';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import type { SessionUser } from '../common/types/access-context';
import { SingleFileUpload } from '../common/uploads/single-file-upload.decorator';
import type { UploadedFileLike } from '../common/uploads/image-file';
import { CreateFitReportDto, FitReportsQueryDto, UpdateFitReportDto } from './dto/fit-report.dto';
import { FitReportResponseDto } from './dto/fit-report-response.dto';
import { FIT_REPORT_PHOTO_MAX_BYTES, FitReportsService } from './fit-reports.service';

/** Sending fit reports from a published guide, and the reporter's own list. */
@ApiTags('fit reports')
@SignedIn()
@Controller()
export class FitReportsController {
  constructor(@Inject(FitReportsService) private readonly reports: FitReportsService) {}

  @Post('guides/:workshopSlug/:guideSlug/fit-reports')
  @ApiCreatedResponse({ type: FitReportResponseDto })
  @ApiTooManyRequestsResponse({ description: 'More than 10 reports from this person in the last hour' })
  create(
    @CurrentUser() user: SessionUser,
    @Param('workshopSlug') workshopSlug: string,
    @Param('guideSlug') guideSlug: string,
    @Body() body: CreateFitReportDto,
  ): Promise<FitReportResponseDto> {
    return this.reports.create(user.id, workshopSlug, guideSlug, body);
  }

  @Get('fit-reports')
  @ApiOkResponse({ type: [FitReportResponseDto], description: "The caller's own reports, newest first" })
  mine(@CurrentUser() user: SessionUser): Promise<FitReportResponseDto[]> {
    return this.reports.mine(user.id);
  }

  @Post('fit-reports/:reportId/photos')
  @SingleFileUpload('photo', { maxBytes: FIT_REPORT_PHOTO_MAX_BYTES, what: 'The photo', expected: 'one image' })
  @ApiCreatedResponse({ type: FitReportResponseDto, description: 'The report with its photos' })
  addPhoto(
    @CurrentUser() user: SessionUser,
    @Param('reportId', ParseUUIDPipe) reportId: string,
    @UploadedFile() file: UploadedFileLike | undefined,
  ): Promise<FitReportResponseDto> {
    return this.reports.addPhoto(user.id, reportId, file);
  }

  @Get('fit-reports/:reportId/photos/:photoId')
  @Redirect()
  @ApiFoundResponse({ description: 'Redirects to a short-lived link to the photo' })
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
  @ApiOkResponse({ type: [FitReportResponseDto], description: 'Newest first' })
  list(@Param('workshopId', ParseUUIDPipe) workshopId: string, @Query() query: FitReportsQueryDto): Promise<FitReportResponseDto[]> {
    return this.reports.listForWorkshop(workshopId, query.status);
  }

  @Patch(':reportId')
  @ApiOkResponse({ type: FitReportResponseDto })
  update(
    @Param('workshopId', ParseUUIDPipe) workshopId: string,
    @Param('reportId', ParseUUIDPipe) reportId: string,
    @Body() body: UpdateFitReportDto,
  ): Promise<FitReportResponseDto> {
    return this.reports.update(workshopId, reportId, body);
  }

  @Get(':reportId/photos/:photoId')
  @Redirect()
  @ApiFoundResponse({ description: 'Redirects to a short-lived link to the photo' })
  async photo(
    @Param('workshopId', ParseUUIDPipe) workshopId: string,
    @Param('reportId', ParseUUIDPipe) reportId: string,
    @Param('photoId', ParseUUIDPipe) photoId: string,
  ) {
    return { url: await this.reports.photoUrlForWorkshop(workshopId, reportId, photoId), statusCode: 302 };
  }
}
