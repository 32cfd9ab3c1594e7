import { Controller, Get, Inject, Param, ParseUUIDPipe } from '@nestjs/common';
import { ApiNotFoundResponse, ApiOkResponse, ApiTags } from '@nestjs/swagger';
import { WorkshopEditor } from '../common/decorators/access.decorator';
import { DeletionImpactDto } from './deletion-impact.dto';
import { DeletionImpactService } from './deletion-impact.service';

/** What a delete would take with it, for the studio's "delete?" question. Editors (the ones who may delete). */
@ApiTags('deletion impact')
@WorkshopEditor()
@Controller('workshops/:workshopId')
export class DeletionImpactController {
  constructor(@Inject(DeletionImpactService) private readonly impact: DeletionImpactService) {}

  @Get('builds/:buildId/deletion-impact')
  @ApiOkResponse({ type: DeletionImpactDto })
  @ApiNotFoundResponse({ description: 'No such build in this workshop' })
  build(@Param('workshopId', ParseUUIDPipe) workshopId: string, @Param('buildId', ParseUUIDPipe) buildId: string): Promise<DeletionImpactDto> {
    return this.impact.build(workshopId, buildId);
  }

  @Get('assemblies/:assemblyId/deletion-impact')
  @ApiOkResponse({ type: DeletionImpactDto })
  @ApiNotFoundResponse({ description: 'No such assembly in this workshop' })
  assembly(@Param('workshopId', ParseUUIDPipe) workshopId: string, @Param('assemblyId', ParseUUIDPipe) assemblyId: string): Promise<DeletionImpactDto> {
    return this.impact.assembly(workshopId, assemblyId);
  }

  @Get('footage/:footageId/deletion-impact')
  @ApiOkResponse({ type: DeletionImpactDto })
  @ApiNotFoundResponse({ description: 'No such footage in this workshop' })
  footage(@Param('workshopId', ParseUUIDPipe) workshopId: string, @Param('footageId', ParseUUIDPipe) footageId: string): Promise<DeletionImpactDto> {
    return this.impact.footage(workshopId, footageId);
  }
}
