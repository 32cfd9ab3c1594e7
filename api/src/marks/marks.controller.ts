import { Body, Controller, Delete, Get, HttpCode, Inject, Param, ParseUUIDPipe, Patch, Post, Query } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import { WorkshopEditor } from '../common/decorators/access.decorator';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import type { SessionUser } from '../common/types/access-context';
import { AcceptSuggestionDto, CreateMarkDto, ListMarksQueryDto, ListSuggestionsQueryDto, UpdateMarkDto } from './dto/mark.dto';
import { toAcceptedResponse, toMarkResponse, toSuggestionResponse } from './mark.mapper';
import { MarksService } from './marks.service';

/** Marks of one footage and the suggestions mined from its transcript. */
@ApiTags('marks')
@WorkshopEditor()
@Controller('workshops/:workshopId/footage/:footageId')
export class MarksController {
  constructor(@Inject(MarksService) private readonly marks: MarksService) {}

  @Get('marks')
  async list(
    @Param('workshopId', ParseUUIDPipe) workshopId: string,
    @Param('footageId', ParseUUIDPipe) footageId: string,
    @Query() query: ListMarksQueryDto,
  ) {
    return (await this.marks.list(workshopId, footageId, query.kind)).map(toMarkResponse);
  }

  @Post('marks')
  async create(
    @Param('workshopId', ParseUUIDPipe) workshopId: string,
    @Param('footageId', ParseUUIDPipe) footageId: string,
    @CurrentUser() user: SessionUser,
    @Body() body: CreateMarkDto,
  ) {
    return toMarkResponse(await this.marks.create(workshopId, footageId, user.id, body));
  }

  @Patch('marks/:markId')
  async update(
    @Param('workshopId', ParseUUIDPipe) workshopId: string,
    @Param('footageId', ParseUUIDPipe) footageId: string,
    @Param('markId', ParseUUIDPipe) markId: string,
    @CurrentUser() user: SessionUser,
    @Body() body: UpdateMarkDto,
  ) {
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
  async suggestions(
    @Param('workshopId', ParseUUIDPipe) workshopId: string,
    @Param('footageId', ParseUUIDPipe) footageId: string,
    @Query() query: ListSuggestionsQueryDto,
  ) {
    return (await this.marks.listSuggestions(workshopId, footageId, query.status)).map(toSuggestionResponse);
  }

  @Post('mark-suggestions/:suggestionId/accept')
  async accept(
    @Param('workshopId', ParseUUIDPipe) workshopId: string,
    @Param('footageId', ParseUUIDPipe) footageId: string,
    @Param('suggestionId', ParseUUIDPipe) suggestionId: string,
    @CurrentUser() user: SessionUser,
    @Body() body: AcceptSuggestionDto,
  ) {
    return toAcceptedResponse(await this.marks.accept(workshopId, footageId, suggestionId, user.id, body));
  }

  @Post('mark-suggestions/:suggestionId/dismiss')
  async dismiss(
    @Param('workshopId', ParseUUIDPipe) workshopId: string,
    @Param('footageId', ParseUUIDPipe) footageId: string,
    @Param('suggestionId', ParseUUIDPipe) suggestionId: string,
    @CurrentUser() user: SessionUser,
  ) {
    return toSuggestionResponse(await this.marks.dismiss(workshopId, footageId, suggestionId, user.id));
  }
}
