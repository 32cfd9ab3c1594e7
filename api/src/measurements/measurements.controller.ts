import { Body, Controller, Delete, Get, HttpCode, Inject, Param, ParseUUIDPipe, Post, Query } from '@nestjs/common';
import { ApiCreatedResponse, ApiNoContentResponse, ApiOkResponse, ApiTags } from '@nestjs/swagger';
import { WorkshopEditor } from '../common/decorators/access.decorator';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import type { SessionUser } from '../common/types/access-context';
import { CreateMeasurementDto, ListMeasurementsQueryDto, MeasurementListDto, MeasurementResponseDto } from './dto/measurement.dto';
import { summariseMeasurements, toMeasurementResponse } from './measurement.mapper';
import { MeasurementsService } from './measurements.service';

@ApiTags('measurements')
@WorkshopEditor()
@Controller('workshops/:workshopId/measurements')
export class MeasurementsController {
  constructor(@Inject(MeasurementsService) private readonly measurements: MeasurementsService) {}

  /** Readings of a subject, oldest first, with their summary (mean and spread). */
  @Get()
  @ApiOkResponse({ type: MeasurementListDto })
  async list(@Param('workshopId', ParseUUIDPipe) workshopId: string, @Query() query: ListMeasurementsQueryDto): Promise<MeasurementListDto> {
    const measurements = await this.measurements.list(workshopId, query);
    const oneSubject = Boolean(query.featureId || query.interfaceId);
    return {
      measurements: measurements.map(toMeasurementResponse),
      summary: oneSubject ? summariseMeasurements(measurements) : null,
    };
  }

  @Post()
  @ApiCreatedResponse({ type: MeasurementResponseDto })
  async create(
    @Param('workshopId', ParseUUIDPipe) workshopId: string,
    @CurrentUser() user: SessionUser,
    @Body() body: CreateMeasurementDto,
  ): Promise<MeasurementResponseDto> {
    return toMeasurementResponse(await this.measurements.create(workshopId, user.id, body));
  }

  @Delete(':measurementId')
  @HttpCode(204)
  @ApiNoContentResponse()
  async remove(
    @Param('workshopId', ParseUUIDPipe) workshopId: string,
    @Param('measurementId', ParseUUIDPipe) measurementId: string,
    @CurrentUser() user: SessionUser,
  ): Promise<void> {
    await this.measurements.remove(workshopId, user.id, measurementId);
  }
}
