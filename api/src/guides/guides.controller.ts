import { Body, Controller, Delete, Get, HttpCode, Inject, Param, ParseUUIDPipe, Patch, Post, Put, Query } from '@nestjs/common';
import { ApiNoContentResponse, ApiTags, ApiUnprocessableEntityResponse } from '@nestjs/swagger';
import { WorkshopEditor } from '../common/decorators/access.decorator';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import type { SessionUser } from '../common/types/access-context';
import {
  CreateGuideDto,
  CreateStepDto,
  GuideStepsQueryDto,
  PublishRevisionDto,
  ReorderStepsDto,
  UpdateGuideDto,
  UpdateStepDto,
} from './dto/guide.dto';
import { GuidesService } from './guides.service';

/** Writing, ordering and publishing a build's guides. Workshop editors and owners only. */
@ApiTags('guides')
@WorkshopEditor()
@Controller('workshops/:workshopId')
export class GuidesController {
  constructor(@Inject(GuidesService) private readonly guides: GuidesService) {}

  @Get('builds/:buildId/guides')
  list(@Param('workshopId', ParseUUIDPipe) workshopId: string, @Param('buildId', ParseUUIDPipe) buildId: string) {
    return this.guides.list(workshopId, buildId);
  }

  @Post('builds/:buildId/guides')
  create(
    @Param('workshopId', ParseUUIDPipe) workshopId: string,
    @Param('buildId', ParseUUIDPipe) buildId: string,
    @CurrentUser() user: SessionUser,
    @Body() body: CreateGuideDto,
  ) {
    return this.guides.create(workshopId, buildId, user.id, body);
  }

  /** Steps a mark can be tied to (for the marking workspace). */
  @Get('guide-steps')
  stepChoices(@Param('workshopId', ParseUUIDPipe) workshopId: string, @Query() query: GuideStepsQueryDto) {
    return this.guides.stepChoices(workshopId, query.footageId);
  }

  @Get('guides/:guideId')
  get(@Param('workshopId', ParseUUIDPipe) workshopId: string, @Param('guideId', ParseUUIDPipe) guideId: string) {
    return this.guides.describe(workshopId, guideId);
  }

  @Patch('guides/:guideId')
  update(
    @Param('workshopId', ParseUUIDPipe) workshopId: string,
    @Param('guideId', ParseUUIDPipe) guideId: string,
    @Body() body: UpdateGuideDto,
  ) {
    return this.guides.update(workshopId, guideId, body);
  }

  @Delete('guides/:guideId')
  @HttpCode(204)
  @ApiNoContentResponse({ description: 'Deleted with its steps and revisions' })
  async remove(@Param('workshopId', ParseUUIDPipe) workshopId: string, @Param('guideId', ParseUUIDPipe) guideId: string): Promise<void> {
    await this.guides.remove(workshopId, guideId);
  }

  @Post('guides/:guideId/steps')
  addStep(
    @Param('workshopId', ParseUUIDPipe) workshopId: string,
    @Param('guideId', ParseUUIDPipe) guideId: string,
    @Body() body: CreateStepDto,
  ) {
    return this.guides.addStep(workshopId, guideId, body);
  }

  /** Declared before steps/:stepId so "order" is not read as a step id. */
  @Put('guides/:guideId/steps/order')
  reorderSteps(
    @Param('workshopId', ParseUUIDPipe) workshopId: string,
    @Param('guideId', ParseUUIDPipe) guideId: string,
    @Body() body: ReorderStepsDto,
  ) {
    return this.guides.reorderSteps(workshopId, guideId, body.stepIds);
  }

  @Patch('guides/:guideId/steps/:stepId')
  updateStep(
    @Param('workshopId', ParseUUIDPipe) workshopId: string,
    @Param('guideId', ParseUUIDPipe) guideId: string,
    @Param('stepId', ParseUUIDPipe) stepId: string,
    @Body() body: UpdateStepDto,
  ) {
    return this.guides.updateStep(workshopId, guideId, stepId, body);
  }

  @Delete('guides/:guideId/steps/:stepId')
  @HttpCode(204)
  async removeStep(
    @Param('workshopId', ParseUUIDPipe) workshopId: string,
    @Param('guideId', ParseUUIDPipe) guideId: string,
    @Param('stepId', ParseUUIDPipe) stepId: string,
  ): Promise<void> {
    await this.guides.removeStep(workshopId, guideId, stepId);
  }

  @Post('guides/:guideId/revisions')
  @ApiUnprocessableEntityResponse({ description: 'The guide has no steps yet' })
  publish(
    @Param('workshopId', ParseUUIDPipe) workshopId: string,
    @Param('guideId', ParseUUIDPipe) guideId: string,
    @CurrentUser() user: SessionUser,
    @Body() body: PublishRevisionDto,
  ) {
    return this.guides.publish(workshopId, guideId, user.id, body.note);
  }

  @Get('guides/:guideId/revisions')
  revisions(@Param('workshopId', ParseUUIDPipe) workshopId: string, @Param('guideId', ParseUUIDPipe) guideId: string) {
    return this.guides.listRevisions(workshopId, guideId);
  }

  @Delete('guides/:guideId/publication')
  @HttpCode(204)
  @ApiNoContentResponse({ description: 'Withdrawn from public view; its revisions are kept' })
  async withdraw(@Param('workshopId', ParseUUIDPipe) workshopId: string, @Param('guideId', ParseUUIDPipe) guideId: string): Promise<void> {
    await this.guides.withdraw(workshopId, guideId);
  }
}
