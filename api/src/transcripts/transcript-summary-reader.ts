import { Injectable } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { Repository } from 'typeorm';
import type { TranscriptSummaryDto } from '../footage/dto/footage.dto';
import { TranscriptSummaries } from '../footage/transcript-summaries.port';
import { Transcript } from './entities/transcript.entity';

/** The active transcript's revision and cue count per footage, for footage lists (one query, no cues read). */
@Injectable()
export class TranscriptSummaryReader implements TranscriptSummaries {
  constructor(@InjectRepository(Transcript) private readonly transcripts: Repository<Transcript>) {}

  async activeFor(footageIds: string[]): Promise<Map<string, TranscriptSummaryDto>> {
    if (!footageIds.length) return new Map();
    const rows: { footage_id: string; revision: number | string; cue_count: number | string }[] = await this.transcripts.query(
      `SELECT footage_id, revision, cue_count FROM transcripts WHERE is_active = 1 AND footage_id IN (${footageIds.map(() => '?').join(', ')})`,
      footageIds,
    );
    return new Map(rows.map((row) => [row.footage_id, { revision: Number(row.revision), cueCount: Number(row.cue_count) }]));
  }
}
