import { Body, Controller, Get, HttpCode, Inject, Post, Query } from '@nestjs/common';
import { ApiBadRequestResponse, ApiOkResponse, ApiOperation, ApiTags } from '@nestjs/swagger';
import { Public } from '../common/decorators/access.decorator';
import { FitQueryDto } from './dto/fit-query.dto';
import { SplineDimensionsDto, SplineDimensionsQueryDto, SplineIdentificationDto, SplineIdentifyQueryDto } from './dto/spline-query.dto';
import { ExtractMeasurementsDto, ParseTranscriptDto } from './dto/text-input.dto';
import { ToolsService } from './tools.service';

/** Calculators open to everyone, viewers included. */
@ApiTags('tools')
@Public()
@Controller('tools')
export class ToolsController {
  constructor(@Inject(ToolsService) private readonly tools: ToolsService) {}

  @Get('fits')
  fits(@Query() query: FitQueryDto) {
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
  extractMeasurements(@Body() body: ExtractMeasurementsDto) {
    return this.tools.extractMeasurements(body.text);
  }

  @Post('transcripts/parse')
  @HttpCode(200)
  parseTranscript(@Body() body: ParseTranscriptDto) {
    return this.tools.parseTranscript(body.text, body.format);
  }
}
