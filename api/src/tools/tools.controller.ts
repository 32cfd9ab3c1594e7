import { Body, Controller, Get, HttpCode, Inject, Post, Query } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import { Public } from '../common/decorators/access.decorator';
import { FitQueryDto } from './dto/fit-query.dto';
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
