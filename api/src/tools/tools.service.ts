import { Injectable } from '@nestjs/common';
import { extractMeasurements, fitLimits, parseTranscript, toNanometres } from '../engine';
import { FitQueryDto } from './dto/fit-query.dto';
import { ParseTranscriptDto } from './dto/text-input.dto';

@Injectable()
export class ToolsService {
  calculateFit(query: FitQueryDto) {
    const sizeMm = toNanometres(query.size, query.unit) / 1_000_000;
    return fitLimits({ sizeMm, hole: query.hole, shaft: query.shaft });
  }

  extractMeasurements(text: string) {
    return { measurements: extractMeasurements(text) };
  }

  parseTranscript(text: string, format: ParseTranscriptDto['format']) {
    const { format: detected, cues } = parseTranscript(text, format);
    return { format: detected, cues: cues.map(({ startMs, endMs, text: cueText }) => ({ startMs, endMs, text: cueText })) };
  }
}
