import { Body, Controller, Get, HttpCode, Inject, Post, Query, UseGuards } from '@nestjs/common';
import {
  ApiBadRequestResponse,
  ApiOkResponse,
  ApiOperation,
  ApiTags,
  ApiTooManyRequestsResponse,
  ApiUnprocessableEntityResponse,
} from '@nestjs/swagger';
import { Public } from '../common/decorators/access.decorator';
import { FitLimitsDto, FitQueryDto } from './dto/fit-query.dto';
import { SplineDimensionsDto, SplineDimensionsQueryDto, SplineIdentificationDto, SplineIdentifyQueryDto } from './dto/spline-query.dto';
import { ExtractMeasurementsDto, ParseTranscriptDto } from './dto/text-input.dto';
import { ExtractedMeasurementsDto, ParsedTranscriptDto } from './dto/text-output.dto';
import { TextToolsService } from './text-tools.service';
import { TextWork, ToolsThrottlerGuard } from './tools-throttler.guard';
import { ToolsService } from './tools.service';

/** Calculators open to everyone, viewers included; rate-limited per client address (TOOLS_RATE_LIMIT, TOOLS_TEXT_RATE_LIMIT). */
@ApiTags('tools')
@Public()
@UseGuards(ToolsThrottlerGuard)
@ApiTooManyRequestsResponse({ description: 'Too many calculator requests from this address; wait a minute' })
@Controller('tools')
export class ToolsController {
  constructor(
    @Inject(ToolsService) private readonly tools: ToolsService,
    @Inject(TextToolsService) private readonly textTools: TextToolsService,
  ) {}

  @Get('fits')
  @ApiOkResponse({ type: FitLimitsDto })
  fits(@Query() query: FitQueryDto): FitLimitsDto {
    return this.tools.calculateFit(query);
  }

  @Get('splines')
  @ApiOperation({ summary: 'Basic dimensions of an involute spline (ANSI B92.1 inch, ISO 4156 / ANSI B92.2M metric)' })
  @ApiOkResponse({ type: SplineDimensionsDto })
  @ApiBadRequestResponse({ description: 'A field the standards do not define, named in the message' })
  splines(@Query() query: SplineDimensionsQueryDto) {
    return this.tools.splineDimensions(query);
  }

  @Get('splines/identify')
  @ApiOperation({ summary: 'Candidate spline designations for a tooth count and a measured major or minor diameter' })
  @ApiOkResponse({ type: SplineIdentificationDto })
  @ApiBadRequestResponse({ description: 'Missing or impossible reading, unit or tooth count' })
  identifySpline(@Query() query: SplineIdentifyQueryDto) {
    return this.tools.identifySpline(query);
  }

  @Post('measurements/extract')
  @HttpCode(200)
  @TextWork()
  @ApiOkResponse({ type: ExtractedMeasurementsDto, description: 'At most 1,000 measurements; `truncated` says when there were more' })
  @ApiBadRequestResponse({ description: 'text missing, not a string, or longer than 200,000 characters' })
  extractMeasurements(@Body() body: ExtractMeasurementsDto): Promise<ExtractedMeasurementsDto> {
    return this.textTools.extractMeasurements(body.text);
  }

  @Post('transcripts/parse')
  @HttpCode(200)
  @TextWork()
  @ApiOkResponse({ type: ParsedTranscriptDto, description: 'At most 5,000 cues; `truncated` says when there were more' })
  @ApiBadRequestResponse({ description: 'text missing, not a string, or longer than 1,000,000 characters' })
  @ApiUnprocessableEntityResponse({ description: '`{ message, line }` naming the first line the parser cannot accept' })
  parseTranscript(@Body() body: ParseTranscriptDto): ParsedTranscriptDto {
    return this.textTools.parseTranscript(body.text, body.format);
  }
}
