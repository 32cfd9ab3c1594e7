import { Controller, Get, HttpStatus, Inject, Res } from '@nestjs/common';
import { ApiOkResponse, ApiServiceUnavailableResponse, ApiTags } from '@nestjs/swagger';
import type { Response } from 'express';
import { Public } from '../common/decorators/access.decorator';
import { HealthReportDto } from './health-report.dto';
import { HealthService } from './health.service';

@ApiTags('health')
@Controller('health')
export class HealthController {
  constructor(@Inject(HealthService) private readonly health: HealthService) {}

  @Public()
  @Get()
  @ApiOkResponse({ type: HealthReportDto, description: 'Every service answered' })
  @ApiServiceUnavailableResponse({ type: HealthReportDto, description: 'At least one check is down' })
  async check(@Res({ passthrough: true }) response: Response): Promise<HealthReportDto> {
    const report = await this.health.check();
    if (report.status === 'ok') return report;
    response.status(HttpStatus.SERVICE_UNAVAILABLE);
    const down = Object.entries(report.checks)
      .filter(([, state]) => state === 'down')
      .map(([name]) => name);
    return { statusCode: HttpStatus.SERVICE_UNAVAILABLE, message: `Down: ${down.join(', ')}`, ...report };
  }
}
