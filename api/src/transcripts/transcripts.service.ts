import {
  BadRequestException,
  ConflictException,
  Inject,
  Injectable,
  NotFoundException,
  PayloadTooLargeException,
  UnprocessableEntityException,
} from '@nestjs/common';
import { EventEmitter2 } from '@nestjs/event-emitter';
import { InjectRepository } from '@nestjs/typeorm';
import { EntityManager, Repository } from 'typeorm';
import { formatTimestamp, formatWebVtt, parseTranscript, TranscriptParseError } from '../engine/transcript-formats';
import { Footage } from '../footage/entities/footage.entity';
import { FootageService } from '../footage/footage.service';
import { sanitiseFileName } from '../footage/upload-plan';
import {
  CUE_WINDOW_MAX,
  CueMatchDto,
  type CueWindowQueryDto,
  type CueWindowResponseDto,
  FootageSearchResponseDto,
  type HitMomentsResponseDto,
  SearchQueryDto,
  TranscriptDto,
  TranscriptFormatChoice,
  TranscriptRevisionDto,
  WorkshopSearchResponseDto,
} from './dto/transcript.dto';
import { TranscriptCue } from './entities/transcript-cue.entity';
import { Transcript } from './entities/transcript.entity';
import { searchTerms } from './transcript-search';
import { TRANSCRIPT_MAX_BYTES, TRANSCRIPT_MAX_CUES } from '../engine/transcript-limits';
import { toCue, toTranscript, toTranscriptRevision } from './transcript.mapper';
import { TRANSCRIPT_ATTACHED, TranscriptAttachedEvent } from './transcripts.events';

/** Longest cue text stored; a transcript line is a sentence or two. */
const MAX_CUE_CHARACTERS = 5_000;
/** Rows per INSERT when storing cues. */
const CUE_BATCH = 1_000;

export interface TranscriptSource {
  text: string;
  format: TranscriptFormatChoice;
  /** The attached file's name; absent when the text was pasted. */
  fileName?: string;
}

/** A footage's transcripts: import (every revision kept), export as WebVTT and FULLTEXT search. */
@Injectable()
export class TranscriptsService {
  constructor(
    @InjectRepository(Transcript) private readonly transcripts: Repository<Transcript>,
    @InjectRepository(TranscriptCue) private readonly cues: Repository<TranscriptCue>,
    @Inject(FootageService) private readonly footage: FootageService,
    @Inject(EventEmitter2) private readonly events: EventEmitter2,
  ) {}

  /**
   * Parses and stores a transcript as the footage's new active revision. A bad file answers 422
   * naming its first bad line (TranscriptParseError); nothing is stored then.
   */
  async attach(workshopId: string, footageId: string, userId: string, source: TranscriptSource): Promise<TranscriptDto> {
    const footage = await this.footage.get(workshopId, footageId);
    if (footage.state !== 'ready') {
      throw new ConflictException(
        `Attach the transcript once the footage is ready (it is ${footage.state}): its length bounds the cue times`,
      );
    }
    const bytes = Buffer.byteLength(source.text, 'utf8');
    if (bytes > TRANSCRIPT_MAX_BYTES) {
      throw new PayloadTooLargeException(`The transcript is ${bytes} bytes; the most accepted is ${TRANSCRIPT_MAX_BYTES} (2 MB)`);
    }
    const parsed = parseTranscript(source.text, source.format, {
      durationMs: footage.durationMs ?? undefined,
      maxCues: TRANSCRIPT_MAX_CUES,
    });
    if (parsed.cues.length === 0) throw new TranscriptParseError(1, 'the transcript has no cues');
    parsed.cues.forEach((cue, index) => this.checkCue(cue, index, footage.durationMs));

    const transcript = await this.transcripts.manager.transaction(async (manager) => {
      // Lock the footage row so two imports at once get consecutive revisions.
      await manager.createQueryBuilder(Footage, 'footage').setLock('pessimistic_write').where({ id: footage.id }).getOneOrFail();
      const { latest } = (await manager
        .createQueryBuilder(Transcript, 'transcript')
        .select('MAX(transcript.revision)', 'latest')
        .where({ footageId: footage.id })
        .getRawOne<{ latest: number | string | null }>()) ?? { latest: null };
      await manager.update(Transcript, { footageId: footage.id, isActive: true }, { isActive: false });
      const created = manager.create(Transcript, {
        workshopId,
        footageId: footage.id,
        revision: Number(latest ?? 0) + 1,
        format: parsed.format,
        sourceName: source.fileName ? sanitiseFileName(source.fileName) : null,
        sourceText: source.text,
        cueCount: parsed.cues.length,
        isActive: true,
        createdBy: userId,
      });
      await manager.insert(Transcript, created);
      await this.insertCues(
        manager,
        created.id,
        parsed.cues.map((cue) => ({ ...cue, identifier: cue.identifier?.slice(0, 255) })),
      );
      return created;
    });
    // Announced after the commit, so listeners (marks mining) read the stored revision.
    const attached: TranscriptAttachedEvent = { workshopId, footageId: footage.id, transcriptId: transcript.id };
    await this.events.emitAsync(TRANSCRIPT_ATTACHED, attached);
    // Answer from what was just stored rather than reading 3,000 rows back.
    return {
      ...toTranscriptRevision({ ...transcript, createdAt: transcript.createdAt ?? new Date() }),
      cues: parsed.cues.map((cue, index) => ({ index, startMs: cue.startMs, endMs: cue.endMs, text: cue.text })),
    };
  }

  /** The active revision (or the given one) with its cues. */
  async read(workshopId: string, footageId: string, revision?: number): Promise<TranscriptDto> {
    const transcript = await this.find(workshopId, footageId, revision);
    const cues = await this.cues.find({ where: { transcriptId: transcript.id }, order: { cueIndex: 'ASC' } });
    return toTranscript(transcript, cues);
  }

  async revisions(workshopId: string, footageId: string): Promise<TranscriptRevisionDto[]> {
    await this.footage.get(workshopId, footageId);
    const rows = await this.transcripts.find({ where: { workshopId, footageId }, order: { revision: 'DESC' } });
    return rows.map(toTranscriptRevision);
  }

  /** A WebVTT file of the active revision (or the given one), for a `<track>` or a download. */
  async exportWebVtt(workshopId: string, footageId: string, revision?: number): Promise<{ fileName: string; body: string }> {
    const footage = await this.footage.get(workshopId, footageId);
    const transcript = await this.find(workshopId, footageId, revision);
    const cues = await this.cues.find({ where: { transcriptId: transcript.id }, order: { cueIndex: 'ASC' } });
    const body = formatWebVtt(
      cues.map((cue) => ({
        startMs: cue.startMs,
        endMs: cue.endMs,
        text: cue.text,
        ...(cue.identifier ? { identifier: cue.identifier } : {}),
      })),
    );
    const stem = footage.title.replace(/[^\p{L}\p{N} _-]+/gu, '').trim().replace(/\s+/gu, '-') || 'transcript';
    return { fileName: `${stem}-r${transcript.revision}.vtt`, body };
  }

  /** Cues of the footage's active transcript containing every word searched for, in time order, a page at a time. */
  async searchFootage(workshopId: string, footageId: string, page: SearchQueryDto): Promise<FootageSearchResponseDto> {
    await this.footage.get(workshopId, footageId);
    const { terms, booleanQuery } = this.requireTerms(page.q);
    const [rows, total] = await this.cues
      .createQueryBuilder('cue')
      .innerJoin(Transcript, 'transcript', 'transcript.id = cue.transcriptId')
      .where('transcript.workshopId = :workshopId', { workshopId })
      .andWhere('transcript.footageId = :footageId', { footageId })
      .andWhere('transcript.isActive = 1')
      .andWhere('MATCH(cue.text) AGAINST (:booleanQuery IN BOOLEAN MODE)', { booleanQuery })
      .orderBy('cue.startMs', 'ASC')
      // A stable order, so pages never repeat or skip a cue.
      .addOrderBy('cue.cueIndex', 'ASC')
      .offset(page.offset)
      .limit(page.limit)
      .getManyAndCount();
    return { terms, total, offset: page.offset, results: rows.map(toCueMatch) };
  }

  /** When each hit of the active transcript starts (every one, in time order): one indexed column, no text. */
  async hitMoments(workshopId: string, footageId: string, q: string): Promise<HitMomentsResponseDto> {
    await this.footage.get(workshopId, footageId);
    const { terms, booleanQuery } = this.requireTerms(q);
    const rows: { start_ms: number | string }[] = await this.cues.query(
      `SELECT cue.start_ms FROM transcript_cues cue
         JOIN transcripts transcript ON transcript.id = cue.transcript_id AND transcript.is_active = 1
        WHERE transcript.workshop_id = ? AND transcript.footage_id = ?
          AND MATCH(cue.text) AGAINST (? IN BOOLEAN MODE)
        ORDER BY cue.start_ms, cue.cue_index
        LIMIT ${TRANSCRIPT_MAX_CUES}`,
      [workshopId, footageId, booleanQuery],
    );
    const startMs = rows.map((row) => Number(row.start_ms));
    return { terms, total: startMs.length, startMs };
  }

  /**
   * A window of the active transcript's cues, by time or by position (see CueWindowQueryDto), so a reader's list
   * fetches what it shows rather than every cue. `transcriptId` comes from the caller that resolved the footage.
   */
  async cueWindow(transcriptId: string, window: CueWindowQueryDto): Promise<CueWindowResponseDto> {
    const byTime = window.fromMs !== undefined || window.toMs !== undefined;
    const byIndex = window.fromIndex !== undefined || window.limit !== undefined;
    if (byTime === byIndex) throw new BadRequestException('Give either fromMs and toMs, or fromIndex (and limit)');
    if (byTime && (window.fromMs === undefined || window.toMs === undefined || window.toMs <= window.fromMs)) {
      throw new BadRequestException('toMs must be greater than fromMs, and both are needed');
    }
    const total = await this.cues.countBy({ transcriptId });
    const query = this.cues.createQueryBuilder('cue').where('cue.transcriptId = :transcriptId', { transcriptId }).orderBy('cue.cueIndex', 'ASC');
    if (byTime) {
      query.andWhere('cue.endMs > :fromMs AND cue.startMs < :toMs', { fromMs: window.fromMs, toMs: window.toMs }).limit(CUE_WINDOW_MAX);
    } else {
      query.andWhere('cue.cueIndex >= :fromIndex', { fromIndex: window.fromIndex ?? 0 }).limit(window.limit ?? 100);
    }
    return { total, cues: (await query.getMany()).map(toCue) };
  }

  /** Cues of every active transcript in the workshop containing every word, best match first, a page at a time. */
  async searchWorkshop(workshopId: string, page: SearchQueryDto): Promise<WorkshopSearchResponseDto> {
    const { terms, booleanQuery } = this.requireTerms(page.q);
    const matching = `FROM transcript_cues cue
         JOIN transcripts transcript ON transcript.id = cue.transcript_id AND transcript.is_active = 1
         JOIN footage ON footage.id = transcript.footage_id
         JOIN builds ON builds.id = footage.build_id
        WHERE transcript.workshop_id = ? AND footage.workshop_id = ?
          AND MATCH(cue.text) AGAINST (? IN BOOLEAN MODE)`;
    const [{ hits }]: { hits: number | string }[] = await this.cues.query(`SELECT COUNT(*) AS hits ${matching}`, [
      workshopId,
      workshopId,
      booleanQuery,
    ]);
    const rows: {
      cue_index: number | string;
      start_ms: number | string;
      end_ms: number | string;
      text: string;
      footage_id: string;
      footage_title: string;
      build_id: string;
      build_title: string;
    }[] = await this.cues.query(
      `SELECT cue.cue_index, cue.start_ms, cue.end_ms, cue.text,
              footage.id AS footage_id, footage.title AS footage_title, builds.id AS build_id, builds.title AS build_title,
              MATCH(cue.text) AGAINST (? IN BOOLEAN MODE) AS relevance
        ${matching}
        ORDER BY relevance DESC, footage.created_at DESC, cue.start_ms ASC, cue.transcript_id ASC, cue.cue_index ASC
        LIMIT ? OFFSET ?`,
      [booleanQuery, workshopId, workshopId, booleanQuery, page.limit, page.offset],
    );
    return {
      terms,
      total: Number(hits),
      offset: page.offset,
      results: rows.map((row) => ({
        cueIndex: Number(row.cue_index),
        startMs: Number(row.start_ms),
        endMs: Number(row.end_ms),
        text: row.text,
        footageId: row.footage_id,
        footageTitle: row.footage_title,
        buildId: row.build_id,
        buildTitle: row.build_title,
      })),
    };
  }

  /** Checks the parser leaves to us: cue length, and cues that start after the footage ends (the wrong file?). */
  private checkCue(cue: { startMs: number; text: string }, index: number, durationMs: number | null): void {
    if (cue.text.length > MAX_CUE_CHARACTERS) {
      throw new UnprocessableEntityException(`Cue ${index + 1} has more than ${MAX_CUE_CHARACTERS} characters of text`);
    }
    if (durationMs !== null && cue.startMs >= durationMs) {
      throw new UnprocessableEntityException(
        `Cue ${index + 1} starts at ${formatTimestamp(cue.startMs, 'webvtt')}, at or after the end of the footage ` +
          `(${formatTimestamp(durationMs, 'webvtt')}): is this the transcript of another video?`,
      );
    }
  }

  private requireTerms(query: string): { terms: string[]; booleanQuery: string } {
    const { terms, booleanQuery } = searchTerms(query);
    if (booleanQuery === null) {
      throw new BadRequestException('Search for at least one word of three or more letters or digits (common words such as "the" are skipped)');
    }
    return { terms, booleanQuery };
  }

  private async find(workshopId: string, footageId: string, revision?: number): Promise<Transcript> {
    await this.footage.get(workshopId, footageId);
    const transcript = await this.transcripts.findOneBy(
      revision === undefined ? { workshopId, footageId, isActive: true } : { workshopId, footageId, revision },
    );
    if (!transcript) {
      throw new NotFoundException(revision === undefined ? 'This footage has no transcript yet' : `Transcript revision ${revision} not found`);
    }
    return transcript;
  }

  /** Multi-row INSERTs: a 3,000-cue transcript is three statements. */
  private async insertCues(
    manager: EntityManager,
    transcriptId: string,
    cues: { startMs: number; endMs: number; text: string; identifier?: string }[],
  ): Promise<void> {
    for (let offset = 0; offset < cues.length; offset += CUE_BATCH) {
      const batch = cues.slice(offset, offset + CUE_BATCH);
      const values: (string | number | null)[] = [];
      batch.forEach((cue, index) => {
        values.push(transcriptId, offset + index, cue.startMs, cue.endMs, cue.identifier ?? null, cue.text);
      });
      await manager.query(
        `INSERT INTO transcript_cues (transcript_id, cue_index, start_ms, end_ms, identifier, text) VALUES ${batch
          .map(() => '(?, ?, ?, ?, ?, ?)')
          .join(', ')}`,
        values,
      );
    }
  }
}

function toCueMatch(cue: TranscriptCue): CueMatchDto {
  const { index, startMs, endMs, text } = toCue(cue);
  return { cueIndex: index, startMs, endMs, text };
}
