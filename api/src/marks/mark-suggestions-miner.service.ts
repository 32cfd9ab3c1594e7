import { createHash } from 'node:crypto';
import { Inject, Injectable, Logger } from '@nestjs/common';
import { DataSource } from 'typeorm';
import { newId } from '../common/database/columns';
import { suggestMarks } from '../engine/mark-suggestions';
import { PartsService } from '../parts/parts.service';
import { readingText } from './spoken-reading';

const PHRASE_MAX = 300;

interface CueRow {
  cue_index: number;
  start_ms: number;
  end_ms: number;
  text: string;
}

export const suggestionKeyHash = (key: string): string => createHash('sha256').update(key, 'utf8').digest('hex');

/**
 * Mines a footage's active transcript for suggested marks and stores them. Rows are keyed by the
 * hash of the miner's stable key, so a re-run refreshes pending ones (new times, new revision) and
 * leaves accepted and dismissed ones exactly as they were.
 */
@Injectable()
export class MarkSuggestionsMiner {
  private readonly logger = new Logger(MarkSuggestionsMiner.name);

  constructor(
    @Inject(DataSource) private readonly dataSource: DataSource,
    @Inject(PartsService) private readonly parts: PartsService,
  ) {}

  /** Returns how many suggestions the active transcript yields (0 when there is none any more). */
  async mine(workshopId: string, footageId: string): Promise<number> {
    // The active revision, not the one the job was queued for: a newer import supersedes an older job.
    const [transcript] = await this.dataSource.query<{ id: string }[]>(
      'SELECT id FROM transcripts WHERE workshop_id = ? AND footage_id = ? AND is_active = 1',
      [workshopId, footageId],
    );
    if (!transcript) return 0;
    const cues = await this.dataSource.query<CueRow[]>(
      'SELECT cue_index, start_ms, end_ms, text FROM transcript_cues WHERE transcript_id = ? ORDER BY cue_index',
      [transcript.id],
    );
    const parts = await this.parts.list(workshopId, {});
    const partIdByNumber = new Map(parts.map((part) => [part.partNumber, part.id]));
    const found = suggestMarks(
      cues.map((cue) => ({ startMs: cue.start_ms, endMs: cue.end_ms, text: cue.text })),
      [...partIdByNumber.keys()],
    );
    // Two mentions with the same key in one transcript are one suggestion (the first).
    const rows = new Map<string, unknown[]>();
    for (const suggestion of found) {
      const keyHash = suggestionKeyHash(suggestion.suggestionKey);
      if (rows.has(keyHash)) continue;
      const isMeasurement = suggestion.kind === 'measurement';
      rows.set(keyHash, [
        newId(),
        workshopId,
        footageId,
        transcript.id,
        cues[suggestion.cueIndex]?.cue_index ?? suggestion.cueIndex,
        suggestion.startMs,
        suggestion.endMs,
        suggestion.kind,
        suggestion.phrase.slice(0, PHRASE_MAX),
        isMeasurement ? readingText(suggestion.value) : null,
        isMeasurement ? suggestion.unit : null,
        isMeasurement ? suggestion.millimetres : null,
        isMeasurement ? null : (partIdByNumber.get(suggestion.partNumber) ?? null),
        keyHash,
      ]);
    }

    await this.dataSource.transaction(async (manager) => {
      // Pending suggestions the new transcript no longer yields go; decided ones stay as history.
      const keep = [...rows.keys()];
      await manager.query(
        `DELETE FROM mark_suggestions WHERE footage_id = ? AND status = 'pending'${keep.length ? ' AND key_hash NOT IN (?)' : ''}`,
        keep.length ? [footageId, keep] : [footageId],
      );
      if (rows.size === 0) return;
      const pendingOnly = (column: string) => `${column} = IF(status = 'pending', VALUES(${column}), ${column})`;
      await manager.query(
        `INSERT INTO mark_suggestions
           (id, workshop_id, footage_id, transcript_id, cue_index, start_ms, end_ms, kind, phrase, value, unit, millimetres, part_id, key_hash)
         VALUES ${[...rows.values()].map(() => '(?)').join(', ')}
         ON DUPLICATE KEY UPDATE ${['transcript_id', 'cue_index', 'start_ms', 'end_ms', 'phrase', 'part_id'].map(pendingOnly).join(', ')}`,
        [...rows.values()],
      );
    });
    this.logger.log(`footage ${footageId}: ${rows.size} suggestion(s) from ${cues.length} cue(s)`);
    return rows.size;
  }
}
