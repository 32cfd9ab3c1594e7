import { Body, Controller, Delete, Get, HttpCode, Inject, Param, ParseUUIDPipe, Patch, Post, Put, Query } from '@nestjs/common';
import { ApiCreatedResponse, ApiNoContentResponse, ApiOkResponse, ApiTags, ApiUnprocessableEntityResponse } from '@nestjs/swagger';
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
import {
  GuideResponseDto,
  GuideRevisionResponseDto,
  GuideStepChoiceDto,
  GuideStepResponseDto,
  GuideSummaryDto,
} from './dto/guide-response.dto';
import { GuidesService } from './guides.service';

/** Writing, ordering and publishing a build's guides. Workshop editors and owners only. */
@ApiTags('guides')
@WorkshopEditor()
@Controller('workshops/:workshopId')
export class GuidesController {
  constructor(@Inject(GuidesService) private readonly guides: GuidesService) {}

  @Get('builds/:buildId/guides')
  @ApiOkResponse({ type: [GuideSummaryDto] })
  list(@Param('workshopId', ParseUUIDPipe) workshopId: string, @Param('buildId', ParseUUIDPipe) buildId: string): Promise<GuideSummaryDto[]> {
    return this.guides.list(workshopId, buildId);
  }

  @Post('builds/:buildId/guides')
  @ApiCreatedResponse({ type: GuideResponseDto })
  create(
    @Param('workshopId', ParseUUIDPipe) workshopId: string,
    @Param('buildId', ParseUUIDPipe) buildId: string,
    @CurrentUser() user: SessionUser,
    @Body() body: CreateGuideDto,
  ): Promise<GuideResponseDto> {
    return this.guides.create(workshopId, buildId, user.id, body);
  }

  /** Steps a mark can be tied to (for the marking workspace). */
  @Get('guide-steps')
  @ApiOkResponse({ type: [GuideStepChoiceDto] })
  stepChoices(@Param('workshopId', ParseUUIDPipe) workshopId: string, @Query() query: GuideStepsQueryDto): Promise<GuideStepChoiceDto[]> {
    return this.guides.stepChoices(workshopId, query.footageId);
  }

  @Get('guides/:guideId')
  @ApiOkResponse({ type: GuideResponseDto })
  get(@Param('workshopId', ParseUUIDPipe) workshopId: string, @Param('guideId', ParseUUIDPipe) guideId: string): Promise<GuideResponseDto> {
    return this.guides.describe(workshopId, guideId);
  }

  @Patch('guides/:guideId')
  @ApiOkResponse({ type: GuideResponseDto })
  update(
    @Param('workshopId', ParseUUIDPipe) workshopId: string,
    @Param('guideId', ParseUUIDPipe) guideId: string,
    @Body() body: UpdateGuideDto,
  ): Promise<GuideResponseDto> {
    return this.guides.update(workshopId, guideId, body);
  }

  @Delete('guides/:guideId')
  @HttpCode(204)
  @ApiNoContentResponse({ description: 'Deleted with its steps and revisions' })
  async remove(@Param('workshopId', ParseUUIDPipe) workshopId: string, @Param('guideId', ParseUUIDPipe) guideId: string): Promise<void> {
    await this.guides.remove(workshopId, guideId);
  }

  @Post('guides/:guideId/steps')
  @ApiCreatedResponse({ type: GuideStepResponseDto })
  addStep(
    @Param('workshopId', ParseUUIDPipe) workshopId: string,
    @Param('guideId', ParseUUIDPipe) guideId: string,
    @Body() body: CreateStepDto,
  ): Promise<GuideStepResponseDto> {
    return this.guides.addStep(workshopId, guideId, body);
  }

  /** Declared before steps/:stepId so "order" is not read as a step id. */
  @Put('guides/:guideId/steps/order')
  @ApiOkResponse({ type: GuideResponseDto, description: 'The guide with its steps in the new order' })
  reorderSteps(
    @Param('workshopId', ParseUUIDPipe) workshopId: string,
    @Param('guideId', ParseUUIDPipe) guideId: string,
    @Body() body: ReorderStepsDto,
  ): Promise<GuideResponseDto> {
    return this.guides.reorderSteps(workshopId, guideId, body.stepIds);
  }

  @Patch('guides/:guideId/steps/:stepId')
  @ApiOkResponse({ type: GuideStepResponseDto })
  updateStep(
    @Param('workshopId', ParseUUIDPipe) workshopId: string,
    @Param('guideId', ParseUUIDPipe) guideId: string,
    @Param('stepId', ParseUUIDPipe) stepId: string,
    @Body() body: UpdateStepDto,
  ): Promise<GuideStepResponseDto> {
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
  @ApiCreatedResponse({ type: GuideRevisionResponseDto, description: 'The new revision (publishedBy is not filled in here)' })
  @ApiUnprocessableEntityResponse({ description: 'The guide has no steps yet' })
  publish(
    @Param('workshopId', ParseUUIDPipe) workshopId: string,
    @Param('guideId', ParseUUIDPipe) guideId: string,
    @CurrentUser() user: SessionUser,
    @Body() body: PublishRevisionDto,
  ): Promise<GuideRevisionResponseDto> {
    return this.guides.publish(workshopId, guideId, user.id, body.note);
  }

  @Get('guides/:guideId/revisions')
  @ApiOkResponse({ type: [GuideRevisionResponseDto], description: 'Newest first' })
  revisions(@Param('workshopId', ParseUUIDPipe) workshopId: string, @Param('guideId', ParseUUIDPipe) guideId: string): Promise<GuideRevisionResponseDto[]> {
    return this.guides.listRevisions(workshopId, guideId);
  }

  @Delete('guides/:guideId/publication')
  @HttpCode(204)
  @ApiNoContentResponse({ description: 'Withdrawn from public view; its revisions are kept' })
  async withdraw(@Param('workshopId', ParseUUIDPipe) workshopId: string, @Param('guideId', ParseUUIDPipe) guideId: string): Promise<void> {
    await this.guides.withdraw(workshopId, guideId);
  }
}
