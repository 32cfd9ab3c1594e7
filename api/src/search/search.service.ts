import { BadRequestException, Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import type { DataSource } from 'typeorm';
import type { SessionUser } from '../common/types/access-context';
import { MAX_SEARCH_COUNT, SEARCH_KINDS, type SearchHitDto, type SearchKind, type SearchQueryDto, type SearchResultsDto } from './dto/search.dto';
import { isEmptySearch, parseSearchQuery, type ParsedSearch } from './search-query';
import { highlightSnippet } from './search-snippet';

/**
 * One kind's rows as SQL: the same columns for every kind, so a page is one UNION ALL ordered by score.
 * A public kind reads its matches from one FULLTEXT table alone (`candidates`: id columns and `score`)
 * and LEFT JOINs what makes a match visible (published revision, enabled workshop, filters), so each
 * candidate gives a row and `visible` says whether it is a hit; `sql` places the candidates' derived
 * table where `from` is given. Member kinds have no candidates: their rows are all hits.
 */
interface KindQuery {
  kind: SearchKind;
  candidates?: { sql: string; params: unknown[] };
  sql: (from: string) => string;
  params: unknown[];
}

interface HitRow {
  kind: SearchKind;
  id: string;
  score: number | string;
  published: number | string;
  title: string;
  body: string | null;
  workshopId: string;
  workshopSlug: string;
  workshopName: string;
  vehicle: string | null;
  guideSlug: string | null;
  targetId: string | null;
  startMs: number | string | null;
  checkState: string | null;
  visible: number | string;
}

type BranchRow = HitRow & { branch: number | string; kindTotal: number | string | null; rawCount: number | string | null };

/** Every kind names these columns, in its own order; a page reads them by name so UNION ALL lines them up. */
const COLUMNS = 'kind, id, score, published, title, body, workshopId, workshopSlug, workshopName, vehicle, guideSlug, targetId, startMs, checkState, visible';

/** A part-number hit outranks every FULLTEXT relevance (InnoDB's relevance stays far below this). */
const PART_NUMBER_SCORE = 1000;

/** What one branch of a page gave: its best rows, how many hits it saw, and whether that count is complete. */
interface BranchResult {
  rows: HitRow[];
  count: number;
  complete: boolean;
}

/**
 * Search across published guides (everyone) and a member's own workshops (signed in). A named read
 * model: read-only SQL over the owning tables, each through its own FULLTEXT index (see the Search
 * migration), so there is no second copy of any record to keep in step. Public kinds read only what a
 * published revision shows: the revision's words (`guide_revision_search`), the parts of the assembly it
 * names and the active transcript of the footage it names, in a workshop that is not disabled; a
 * withdrawn guide falls out by the join on `guides.published_revision_id`. Member kinds are limited to
 * the caller's memberships; for those workshops the public part and cue hits give way to the member
 * ones, which open the studio, unless the caller asks for published hits only.
 */
@Injectable()
export class SearchService {
  constructor(@InjectDataSource() private readonly dataSource: DataSource) {}

  async search(query: SearchQueryDto, user: SessionUser | undefined): Promise<SearchResultsDto> {
    const parsed = parseSearchQuery(query.q);
    if (isEmptySearch(parsed)) {
      throw new BadRequestException({
        message: 'q: nothing to search for; use words of three letters or more (not "the", "for"…) or a part number',
        errors: { q: 'Use words of three letters or more, or a part number' },
      });
    }
    const offset = query.offset ?? 0;
    const limit = query.limit ?? 20;
    const memberWorkshopIds = user ? await this.memberWorkshopIds(user.id) : [];
    const all = this.kindQueries(parsed, query, memberWorkshopIds);
    const { rows, counts } = await this.page(all, query.kind, offset, limit);
    const kinds = SEARCH_KINDS.filter((kind) => all.some((entry) => entry.kind === kind));
    const countOf = (kind: SearchKind) => {
      const entry = counts.get(kind) ?? { count: 0, complete: true };
      return { kind, count: Math.min(entry.count, MAX_SEARCH_COUNT), capped: !entry.complete || entry.count > MAX_SEARCH_COUNT };
    };
    const summed = (query.kind ? [query.kind] : kinds).map(countOf);
    return {
      terms: parsed.terms,
      partNumbers: parsed.partNumberKeys,
      total: summed.reduce((sum, entry) => sum + entry.count, 0),
      totalCapped: summed.some((entry) => entry.capped),
      offset,
      limit,
      counts: kinds.map(countOf),
      results: rows.map((row) => toHit(row, parsed)),
    };
  }

  private async memberWorkshopIds(userId: string): Promise<string[]> {
    const rows = await this.dataSource.query<{ workshopId: string }[]>(
      'SELECT workshop_id AS workshopId FROM workshop_members WHERE user_id = ?',
      [userId],
    );
    return rows.map((row) => row.workshopId);
  }

  /**
   * One statement per search. Each public kind ranks a bounded candidate set: the best `CANDIDATES`
   * matches of its FULLTEXT table by relevance (`ORDER BY score DESC LIMIT n` on the table alone, the
   * same shape as a plain MATCH … AGAINST, so InnoDB need not read every match), of which only the
   * visible ones are hits. The page is exact whenever those candidates hold at least `offset + limit`
   * hits or are every match: no hit outside them ranks higher. Otherwise (most candidates are private
   * or filtered out) that kind is read again over all its matches. Counts stop at the candidates: a
   * kind with more matches says "at least" (capped), so no search joins, counts and sorts every match.
   * Kinds not asked for give one row, for their count. The page is cut here, by score (ties by kind
   * and id, so pages are stable).
   */
  private async page(kinds: KindQuery[], asked: SearchKind | undefined, offset: number, limit: number) {
    const take = offset + limit;
    const candidates = Math.max(MAX_SEARCH_COUNT + 1, take);
    const wanted = (kind: KindQuery) => !asked || asked === kind.kind;
    const results = await this.branches(kinds, (kind) => (wanted(kind) ? take : 1), candidates);
    // A wanted kind whose candidates ran out of hits before the page was full is read again in full.
    const again = kinds
      .map((kind, branch) => ({ kind, branch }))
      .filter(({ kind, branch }) => wanted(kind) && !results[branch].complete && results[branch].rows.length < take);
    if (again.length > 0) {
      const full = await this.branches(again.map(({ kind }) => kind), () => take, null);
      again.forEach(({ branch }, index) => (results[branch] = full[index]));
    }
    // A kind may come from two queries (public and member parts): their counts add up.
    const counts = new Map<SearchKind, { count: number; complete: boolean }>();
    kinds.forEach((kind, branch) => {
      const before = counts.get(kind.kind) ?? { count: 0, complete: true };
      counts.set(kind.kind, { count: before.count + results[branch].count, complete: before.complete && results[branch].complete });
    });
    const rows = results
      .flatMap((result) => result.rows)
      .filter((row) => !asked || row.kind === asked)
      .sort((a, b) => Number(b.score) - Number(a.score) || (a.kind < b.kind ? -1 : a.kind > b.kind ? 1 : 0) || (a.id < b.id ? -1 : a.id > b.id ? 1 : 0))
      .slice(offset, offset + limit);
    return { rows, counts };
  }

  /**
   * The UNION ALL of the given kinds, each giving its best `rowsOf(kind)` hits, the hits it saw
   * (`kindTotal`) and, for a bounded read, how many candidates it read (`rawCount`). `candidates` null
   * reads every match.
   */
  private async branches(kinds: KindQuery[], rowsOf: (kind: KindQuery) => number, candidates: number | null): Promise<BranchResult[]> {
    const parts = kinds.map((kind, branch) => {
      let from = '';
      let params = kind.params;
      if (kind.candidates) {
        from =
          candidates === null
            ? `(SELECT x.*, NULL AS rawCount FROM (${kind.candidates.sql}) x)`
            : `(SELECT x.*, COUNT(*) OVER () AS rawCount FROM (${kind.candidates.sql} ORDER BY score DESC LIMIT ${candidates}) x)`;
        params = [...kind.candidates.params, ...kind.params];
      }
      const raw = kind.candidates ? 'MAX(rawCount) OVER ()' : 'NULL';
      return {
        sql: `(SELECT ${COLUMNS}, ${branch} AS branch, SUM(visible) OVER () AS kindTotal, ${raw} AS rawCount
          FROM (${kind.sql(from)}) AS hits ORDER BY visible DESC, score DESC, id LIMIT ${rowsOf(kind)})`,
        params,
      };
    });
    const found = await this.dataSource.query<BranchRow[]>(parts.map((part) => part.sql).join(' UNION ALL '), parts.flatMap((part) => part.params));
    return kinds.map((kind, branch) => {
      const own = found.filter((row) => Number(row.branch) === branch);
      const rawCount = own.length > 0 && own[0].rawCount !== null ? Number(own[0].rawCount) : null;
      return {
        rows: own.filter((row) => Number(row.visible) === 1),
        count: own.length > 0 ? Number(own[0].kindTotal ?? 0) : 0,
        // Complete when every match was read: a bounded read that got fewer candidates than it asked for.
        complete: candidates === null || !kind.candidates || rawCount === null || rawCount < candidates,
      };
    });
  }

  private kindQueries(parsed: ParsedSearch, query: SearchQueryDto, memberWorkshopIds: string[]): KindQuery[] {
    const text = parsed.booleanQuery;
    const keys = parsed.partNumberKeys;
    const filters = new Filters(query);
    const wantPublic = query.state !== 'unpublished';
    const wantMember = query.state !== 'published' && memberWorkshopIds.length > 0;
    const kinds: KindQuery[] = [];
    const members = memberWorkshopIds;
    // Public part and cue hits of the caller's own workshops give way to the member hits only when
    // those are searched too; under "published" they are the only copies, so they stay.
    const replaced = wantMember ? members : [];
    const notMember = replaced.length ? `AND g.workshop_id NOT IN (${replaced.map(() => '?').join(', ')})` : '';
    const inMember = (column: string) => `${column} IN (${members.map(() => '?').join(', ')})`;

    // Published guides: the revision's words, joined to a live, enabled workshop by the published revision.
    // The joins are LEFT and nested, conditions in ON: a candidate that is not public still gives its row.
    const publishedGuide = `JOIN guides g ON g.published_revision_id = rs.revision_id
      JOIN workshops w ON w.id = g.workshop_id AND w.disabled_at IS NULL
      JOIN builds b ON b.id = g.build_id`;

    if (wantPublic && text) {
      const where = filters.sql('w', 'b', 'rs.assembly_id');
      kinds.push({
        kind: 'guide',
        candidates: {
          sql: 'SELECT revision_id, MATCH (search_text) AGAINST (? IN BOOLEAN MODE) AS score FROM guide_revision_search WHERE MATCH (search_text) AGAINST (? IN BOOLEAN MODE)',
          params: [text, text],
        },
        sql: (from) => `SELECT 'guide' AS kind, g.id AS id, m.score AS score, 1 AS published,
            rs.title AS title, rs.search_text AS body, w.id AS workshopId, w.slug AS workshopSlug, w.name AS workshopName,
            b.vehicle AS vehicle, g.slug AS guideSlug, NULL AS targetId, NULL AS startMs, NULL AS checkState,
            g.id IS NOT NULL AS visible, m.rawCount AS rawCount
          FROM ${from} m
          LEFT JOIN (guide_revision_search rs ${publishedGuide}) ON rs.revision_id = m.revision_id ${where.sql}`,
        params: where.params,
      });
      kinds.push({
        kind: 'cue',
        candidates: {
          sql: 'SELECT transcript_id, cue_index, MATCH (text) AGAINST (? IN BOOLEAN MODE) AS score FROM transcript_cues WHERE MATCH (text) AGAINST (? IN BOOLEAN MODE)',
          params: [text, text],
        },
        sql: (from) => `SELECT 'cue' AS kind, CONCAT(g.id, ':', c.transcript_id, ':', c.cue_index) AS id, m.score AS score,
            1 AS published, rs.title AS title, c.text AS body, w.id AS workshopId, w.slug AS workshopSlug, w.name AS workshopName,
            b.vehicle AS vehicle, g.slug AS guideSlug, NULL AS targetId, c.start_ms AS startMs, NULL AS checkState,
            g.id IS NOT NULL AS visible, m.rawCount AS rawCount
          FROM ${from} m
          LEFT JOIN (transcript_cues c
            JOIN transcripts t ON t.id = c.transcript_id AND t.is_active = 1
            JOIN guide_revision_search rs ON rs.footage_id = t.footage_id
            ${publishedGuide})
          ON c.transcript_id = m.transcript_id AND c.cue_index = m.cue_index ${notMember} ${where.sql}`,
        params: [...replaced, ...where.params],
      });
    }
    if (wantPublic && (text || keys.length)) {
      const matched = matchedParts(text, keys, null);
      const where = filters.sql('w', 'b', 'rs.assembly_id');
      kinds.push({
        kind: 'part',
        candidates: matched,
        sql: (from) => `SELECT 'part' AS kind, CONCAT(g.id, ':', p.id) AS id, m.score AS score, 1 AS published,
            CONCAT(p.title, ' · ', p.part_number) AS title, CONCAT_WS(' · ', p.maker, rs.title) AS body,
            w.id AS workshopId, w.slug AS workshopSlug, w.name AS workshopName,
            b.vehicle AS vehicle, g.slug AS guideSlug, NULL AS targetId, NULL AS startMs, NULL AS checkState,
            g.id IS NOT NULL AS visible, m.rawCount AS rawCount
          FROM ${from} m
          LEFT JOIN (parts p
            JOIN assembly_parts ap ON ap.part_id = p.id
            JOIN guide_revision_search rs ON rs.assembly_id = ap.assembly_id
            ${publishedGuide})
          ON p.id = m.id ${notMember} ${where.sql}`,
        params: [...replaced, ...where.params],
      });
    }
    if (!wantMember) return kinds;

    const workshopJoin = 'JOIN workshops w ON w.id = x.workshop_id';
    // A fit-check state narrows member hits to fit checks: the other member kinds carry no check.
    if ((text || keys.length) && !query.checkState) {
      const matched = matchedParts(text, keys, members);
      const where = filters.sql('w', null, null);
      const vehicle = filters.partVehicle();
      kinds.push({
        kind: 'part',
        sql: () => `SELECT 'part' AS kind, x.id AS id, m.score AS score, 0 AS published, CONCAT(x.title, ' · ', x.part_number) AS title,
            CONCAT_WS(' · ', x.maker, x.notes) AS body, w.id AS workshopId, w.slug AS workshopSlug, w.name AS workshopName,
            NULL AS vehicle, NULL AS guideSlug, x.id AS targetId, NULL AS startMs, NULL AS checkState, 1 AS visible
          FROM (${matched.sql}) m JOIN parts x ON x.id = m.id ${workshopJoin}
          WHERE 1 = 1 ${where.sql} ${vehicle.sql}`,
        params: [...matched.params, ...where.params, ...vehicle.params],
      });
    }
    if (!text) return kinds;

    const memberKind = (kind: SearchKind, select: string, from: string, match: string, vehicleBuild: string | null, state: string | null = null): KindQuery => {
      const where = filters.sql('w', vehicleBuild, null, state);
      return {
        kind,
        sql: () => `SELECT '${kind}' AS kind, ${select}, MATCH (${match}) AGAINST (? IN BOOLEAN MODE) AS score, 0 AS published,
            w.id AS workshopId, w.slug AS workshopSlug, w.name AS workshopName, 1 AS visible
          ${from} ${workshopJoin}
          WHERE MATCH (${match}) AGAINST (? IN BOOLEAN MODE) AND ${inMember('x.workshop_id')} ${where.sql}`,
        params: [text, text, ...members, ...where.params],
      };
    };
    const fitChecks = memberKind(
      'fit_check',
      "x.id AS id, x.title AS title, x.reason AS body, b.vehicle AS vehicle, NULL AS guideSlug, x.assembly_id AS targetId, NULL AS startMs, x.state AS checkState",
      'FROM fit_checks x JOIN assemblies a ON a.id = x.assembly_id JOIN builds b ON b.id = a.build_id',
      'x.title, x.reason',
      'b',
      'x.state',
    );
    if (query.checkState) return [...kinds, fitChecks];
    kinds.push(
      memberKind(
        'build',
        "x.id AS id, x.title AS title, CONCAT_WS(' · ', x.vehicle, x.goal) AS body, x.vehicle AS vehicle, NULL AS guideSlug, x.id AS targetId, NULL AS startMs, NULL AS checkState",
        'FROM builds x JOIN builds b ON b.id = x.id',
        'x.title, x.vehicle, x.goal',
        'b',
      ),
      memberKind(
        'footage',
        "x.id AS id, x.title AS title, b.title AS body, b.vehicle AS vehicle, NULL AS guideSlug, x.id AS targetId, NULL AS startMs, NULL AS checkState",
        'FROM footage x JOIN builds b ON b.id = x.build_id',
        'x.title',
        'b',
      ),
      memberKind(
        'cue',
        "CONCAT(c.transcript_id, ':', c.cue_index) AS id, f.title AS title, c.text AS body, b.vehicle AS vehicle, NULL AS guideSlug, f.id AS targetId, c.start_ms AS startMs, NULL AS checkState",
        'FROM transcript_cues c JOIN transcripts x ON x.id = c.transcript_id AND x.is_active = 1 JOIN footage f ON f.id = x.footage_id JOIN builds b ON b.id = f.build_id',
        'c.text',
        'b',
      ),
      memberKind(
        'mark',
        "x.id AS id, f.title AS title, x.label AS body, b.vehicle AS vehicle, NULL AS guideSlug, f.id AS targetId, x.start_ms AS startMs, NULL AS checkState",
        'FROM marks x JOIN footage f ON f.id = x.footage_id JOIN builds b ON b.id = f.build_id',
        'x.label',
        'b',
      ),
      fitChecks,
      memberKind(
        'draft_guide',
        "x.id AS id, x.title AS title, x.summary AS body, b.vehicle AS vehicle, NULL AS guideSlug, x.id AS targetId, NULL AS startMs, NULL AS checkState",
        'FROM guides x JOIN builds b ON b.id = x.build_id',
        'x.title, x.summary',
        'b',
      ),
      memberKind(
        'draft_guide',
        "s.id AS id, CONCAT(x.title, ' — ', s.title) AS title, CONCAT_WS(' ', s.body, s.caution_text) AS body, b.vehicle AS vehicle, NULL AS guideSlug, x.id AS targetId, s.start_ms AS startMs, NULL AS checkState",
        'FROM guide_steps s JOIN guides x ON x.id = s.guide_id JOIN builds b ON b.id = x.build_id',
        's.title, s.body, s.caution_text',
        'b',
      ),
    );
    return kinds;
  }
}

/** Parts matched by words (FULLTEXT) or by part-number key (exact or prefix), each part once with its best score. */
function matchedParts(text: string | null, keys: string[], workshopIds: string[] | null): { sql: string; params: unknown[] } {
  const scope = workshopIds ? `AND workshop_id IN (${workshopIds.map(() => '?').join(', ')})` : '';
  const scopeParams = workshopIds ?? [];
  // The public never matches a part's notes (they are not published); members search them too. Each list is one FULLTEXT index.
  const columns = workshopIds ? 'part_number, maker, title, notes' : 'part_number, maker, title';
  const pieces: string[] = [];
  const params: unknown[] = [];
  if (text) {
    pieces.push(`SELECT id, MATCH (${columns}) AGAINST (? IN BOOLEAN MODE) AS score FROM parts
      WHERE MATCH (${columns}) AGAINST (? IN BOOLEAN MODE) ${scope}`);
    params.push(text, text, ...scopeParams);
  }
  for (const key of keys) {
    // Keys hold only A-Z and 0-9 (parseSearchQuery), so LIKE needs no escaping; an exact key ranks above a prefix.
    pieces.push(`SELECT id, IF(part_number_key = ?, ${PART_NUMBER_SCORE + 1}, ${PART_NUMBER_SCORE}) AS score FROM parts WHERE part_number_key LIKE ? ${scope}`);
    params.push(key, `${key}%`, ...scopeParams);
  }
  return { sql: `SELECT id, MAX(score) AS score FROM (${pieces.join(' UNION ALL ')}) AS candidates GROUP BY id`, params };
}

/** The workshop, vehicle and fit-check state filters as SQL on the aliases a kind uses. */
class Filters {
  constructor(private readonly query: SearchQueryDto) {}

  /**
   * `assembly`: the column naming a published guide's assembly (it matches a check state through that
   * assembly's live checks); `state`: a fit check's own state column. A kind with neither gives no hit
   * under a state filter.
   */
  sql(workshopAlias: string, buildAlias: string | null, assembly: string | null, state: string | null = null): { sql: string; params: unknown[] } {
    let sql = '';
    const params: unknown[] = [];
    if (this.query.workshop) {
      sql += ` AND ${workshopAlias}.slug = ?`;
      params.push(this.query.workshop);
    }
    if (this.query.vehicle?.trim()) {
      if (!buildAlias) return { sql: `${sql} AND 1 = 0`, params };
      sql += ` AND ${buildAlias}.vehicle LIKE ?`;
      params.push(likeContaining(this.query.vehicle));
    }
    if (this.query.checkState) {
      if (state) sql += ` AND ${state} = ?`;
      else if (assembly) sql += ` AND EXISTS (SELECT 1 FROM fit_checks fc WHERE fc.assembly_id = ${assembly} AND fc.state = ?)`;
      else return { sql: `${sql} AND 1 = 0`, params };
      params.push(this.query.checkState);
    }
    return { sql, params };
  }

  /** A part belongs to no build itself: it matches a vehicle through the assemblies it is placed in. */
  partVehicle(): { sql: string; params: unknown[] } {
    if (!this.query.vehicle?.trim()) return { sql: '', params: [] };
    return {
      sql: ` AND EXISTS (SELECT 1 FROM assembly_parts ap JOIN assemblies a ON a.id = ap.assembly_id JOIN builds vb ON vb.id = a.build_id
        WHERE ap.part_id = x.id AND vb.vehicle LIKE ?)`,
      params: [likeContaining(this.query.vehicle)],
    };
  }
}

function likeContaining(text: string): string {
  return `%${text.trim().replace(/[\\%_]/gu, (character) => `\\${character}`)}%`;
}

function toHit(row: HitRow, parsed: ParsedSearch): SearchHitDto {
  const startMs = row.startMs === null ? null : Number(row.startMs);
  const published = Number(row.published) === 1;
  return {
    kind: row.kind,
    id: row.id,
    published,
    title: row.title,
    snippet: highlightSnippet(row.body ?? '', parsed.terms),
    workshop: { name: row.workshopName, slug: row.workshopSlug },
    vehicle: row.vehicle || null,
    startMs,
    checkState: row.checkState,
    link: published ? publicLink(row, startMs) : memberLink(row, startMs),
  };
}

const seconds = (ms: number) => (ms / 1000).toFixed(1);

function publicLink(row: HitRow, startMs: number | null): string {
  const path = `/guides/${encodeURIComponent(row.workshopSlug)}/${encodeURIComponent(row.guideSlug ?? '')}`;
  return startMs === null ? path : `${path}?t=${seconds(startMs)}`;
}

/** The studio pages (config/paths.ts in the studio): footage opens at ?t= seconds. */
function memberLink(row: HitRow, startMs: number | null): string {
  const workshop = `/workshops/${row.workshopId}`;
  const target = row.targetId ?? '';
  switch (row.kind) {
    case 'build':
      return `${workshop}/builds/${target}`;
    case 'part':
      return `${workshop}/parts/${target}`;
    case 'fit_check':
      return `${workshop}/assemblies/${target}`;
    case 'draft_guide':
      return `${workshop}/guides/${target}`;
    case 'footage':
    case 'cue':
    case 'mark':
      return `${workshop}/footage/${target}${startMs === null ? '' : `?t=${seconds(startMs)}`}`;
    default:
      return workshop;
  }
}

