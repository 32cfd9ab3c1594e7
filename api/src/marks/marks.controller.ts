import { Body, Controller, Delete, Get, HttpCode, Inject, Param, ParseUUIDPipe, Patch, Post, Query, Res } from '@nestjs/common';
import { ApiCreatedResponse, ApiHeader, ApiOkResponse, ApiTags } from '@nestjs/swagger';
import type { Response } from 'express';
import { WorkshopEditor } from '../common/decorators/access.decorator';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import type { SessionUser } from '../common/types/access-context';
import { AcceptSuggestionDto, CreateMarkDto, ListMarksQueryDto, ListSuggestionsQueryDto, UpdateMarkDto } from './dto/mark.dto';
import { AcceptedSuggestionResponseDto, MarkResponseDto, MarkSuggestionResponseDto } from './dto/mark-response.dto';
import { toAcceptedResponse, toMarkResponse, toSuggestionResponse } from './mark.mapper';
import { MarksService } from './marks.service';

/** Lists answer whole unless paged (`limit`, `offset`); this header gives the count in all either way. */
const TOTAL_COUNT_HEADER = 'X-Total-Count';

/** Marks of one footage and the suggestions mined from its transcript. */
@ApiTags('marks')
@WorkshopEditor()
@Controller('workshops/:workshopId/footage/:footageId')
export class MarksController {
  constructor(@Inject(MarksService) private readonly marks: MarksService) {}

  @Get('marks')
  @ApiOkResponse({ type: [MarkResponseDto], description: 'By start time' })
  @ApiHeader({ name: TOTAL_COUNT_HEADER, description: 'How many marks there are in all (set on the answer)', required: false })
  async list(
    @Param('workshopId', ParseUUIDPipe) workshopId: string,
    @Param('footageId', ParseUUIDPipe) footageId: string,
    @Query() query: ListMarksQueryDto,
    @Res({ passthrough: true }) response: Response,
  ): Promise<MarkResponseDto[]> {
    const { items, total } = await this.marks.listPage(workshopId, footageId, query.kind, query);
    response.setHeader(TOTAL_COUNT_HEADER, String(total));
    return items.map(toMarkResponse);
  }

  @Post('marks')
  @ApiCreatedResponse({ type: MarkResponseDto })
  async create(
    @Param('workshopId', ParseUUIDPipe) workshopId: string,
    @Param('footageId', ParseUUIDPipe) footageId: string,
    @CurrentUser() user: SessionUser,
    @Body() body: CreateMarkDto,
  ): Promise<MarkResponseDto> {
    return toMarkResponse(await this.marks.create(workshopId, footageId, user.id, body));
  }

  @Patch('marks/:markId')
  @ApiOkResponse({ type: MarkResponseDto })
  async update(
    @Param('workshopId', ParseUUIDPipe) workshopId: string,
    @Param('footageId', ParseUUIDPipe) footageId: string,
    @Param('markId', ParseUUIDPipe) markId: string,
    @CurrentUser() user: SessionUser,
    @Body() body: UpdateMarkDto,
  ): Promise<MarkResponseDto> {
    return toMarkResponse(await this.marks.update(workshopId, footageId, markId, user.id, body));
  }

  @Delete('marks/:markId')
  @HttpCode(204)
  async remove(
    @Param('workshopId', ParseUUIDPipe) workshopId: string,
    @Param('footageId', ParseUUIDPipe) footageId: string,
    @Param('markId', ParseUUIDPipe) markId: string,
  ) {
    await this.marks.remove(workshopId, footageId, markId);
  }

  @Get('mark-suggestions')
  @ApiOkResponse({ type: [MarkSuggestionResponseDto] })
  @ApiHeader({ name: TOTAL_COUNT_HEADER, description: 'How many suggestions there are in all (set on the answer)', required: false })
  async suggestions(
    @Param('workshopId', ParseUUIDPipe) workshopId: string,
    @Param('footageId', ParseUUIDPipe) footageId: string,
    @Query() query: ListSuggestionsQueryDto,
    @Res({ passthrough: true }) response: Response,
  ): Promise<MarkSuggestionResponseDto[]> {
    const { items, total } = await this.marks.listSuggestionsPage(workshopId, footageId, query.status, query);
    response.setHeader(TOTAL_COUNT_HEADER, String(total));
    return items.map(toSuggestionResponse);
  }

  @Post('mark-suggestions/:suggestionId/accept')
  @ApiCreatedResponse({ type: AcceptedSuggestionResponseDto })
  async accept(
    @Param('workshopId', ParseUUIDPipe) workshopId: string,
    @Param('footageId', ParseUUIDPipe) footageId: string,
    @Param('suggestionId', ParseUUIDPipe) suggestionId: string,
    @CurrentUser() user: SessionUser,
    @Body() body: AcceptSuggestionDto,
  ): Promise<AcceptedSuggestionResponseDto> {
    return toAcceptedResponse(await this.marks.accept(workshopId, footageId, suggestionId, user.id, body));
  }

  @Post('mark-suggestions/:suggestionId/dismiss')
  @ApiCreatedResponse({ type: MarkSuggestionResponseDto })
  async dismiss(
    @Param('workshopId', ParseUUIDPipe) workshopId: string,
    @Param('footageId', ParseUUIDPipe) footageId: string,
    @Param('suggestionId', ParseUUIDPipe) suggestionId: string,
    @CurrentUser() user: SessionUser,
  ): Promise<MarkSuggestionResponseDto> {
    return toSuggestionResponse(await this.marks.dismiss(workshopId, footageId, suggestionId, user.id));
  }
}
