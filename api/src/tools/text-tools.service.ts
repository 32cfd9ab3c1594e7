import { Injectable } from '@nestjs/common';
import { setImmediate as nextTurn } from 'node:timers/promises';
import { extractMeasurementsInSlices, parseTranscript } from '../engine';
import { ParseTranscriptDto } from './dto/text-input.dto';
import { ExtractedMeasurementsDto, MAX_CUES_RETURNED, MAX_MEASUREMENTS_RETURNED, ParsedTranscriptDto } from './dto/text-output.dto';

/**
 * The public text tools. Extraction runs in slices of a few milliseconds with a turn of the event
 * loop between them, so a long text delays other requests by one slice, not by the whole scan.
 * (Measured: the whole scan of 200,000 characters takes 0.1–0.4 s here; a worker thread would add a
 * second copy of the engine per process for no gain once the work yields.)
 */
@Injectable()
export class TextToolsService {
  async extractMeasurements(text: string): Promise<ExtractedMeasurementsDto> {
    const slices = extractMeasurementsInSlices(text);
    let slice = slices.next();
    while (!slice.done) {
      await nextTurn();
      slice = slices.next();
    }
    const found = slice.value;
    return {
      measurements: found.slice(0, MAX_MEASUREMENTS_RETURNED),
      total: found.length,
      truncated: found.length > MAX_MEASUREMENTS_RETURNED,
    };
  }

  parseTranscript(text: string, format: ParseTranscriptDto['format']): ParsedTranscriptDto {
    const { format: detected, cues } = parseTranscript(text, format);
    return {
      format: detected,
      cues: cues.slice(0, MAX_CUES_RETURNED).map(({ startMs, endMs, text: cueText }) => ({ startMs, endMs, text: cueText })),
      total: cues.length,
      truncated: cues.length > MAX_CUES_RETURNED,
    };
  }
}
