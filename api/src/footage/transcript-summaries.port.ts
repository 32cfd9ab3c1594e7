import type { TranscriptSummaryDto } from './dto/footage.dto';

/**
 * What a footage list needs of transcripts: the active revision and its cue count per footage. The
 * transcripts domain owns that table and provides this (transcripts/transcripts-ports.module.ts), so
 * footage neither queries it nor imports transcripts, which build on footage.
 */
export abstract class TranscriptSummaries {
  abstract activeFor(footageIds: string[]): Promise<Map<string, TranscriptSummaryDto>>;
}
