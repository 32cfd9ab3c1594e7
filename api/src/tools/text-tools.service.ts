import { Injectable } from '@nestjs/common';
import { setImmediate as nextTurn } from 'node:timers/promises';
import { extractMeasurementsInSlices, parseTranscript } from '../engine';
import { ParseTranscriptDto } from './dto/text-input.dto';
import { ExtractedMeasurementsDto, MAX_CUES_RETURNED, MAX_MEASUREMENTS_RETURNED, ParsedTranscriptDto } from './dto/text-output.dto';

/**
 * The public text tools. Extraction runs in slices (about a thousand tokens each) with a turn of the
 * event loop between them, so a long text delays other requests by one slice, not by the whole scan:
 * `bash bench/run.sh extract` measured a 200,000-character extraction at 0.3–0.9 s on a busy 2-core
 * machine, while a fits call made meanwhile waited at most 45–80 ms. A worker thread would also
 * free the loop, but needs the engine compiled for it (the e2e tests run from TypeScript sources)
 * and copies the text across threads; slicing gives the same bound without either.
 */
@Injectable()
export class TextToolsService {
  async extractMeasurements(text: string): Promise<ExtractedMeasurementsDto> {
    const slices = extractMeasurementsInSlices(text, { limit: MAX_MEASUREMENTS_RETURNED });
    let slice = slices.next();
    while (!slice.done) {
      await nextTurn();
      slice = slices.next();
    }
    const { measurements, total } = slice.value;
    return { measurements, total, truncated: total > measurements.length };
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
