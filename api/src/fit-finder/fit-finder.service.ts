import { BadRequestException, Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { DataSource, In } from 'typeorm';
import { AssemblyInterface } from '../assemblies/entities/assembly-interface.entity';
import { FitCheckEvidence } from '../fit-checks/entities/fit-check-evidence.entity';
import {
  FINDER_STATE_RANK,
  finderStateRank,
  judgeClearance,
  judgeDiameter,
  judgeLength,
  judgeSpline,
  nearSizeWindowNm,
  readFinderLength,
  readFinderPitch,
  showFinderLength,
  type ClearanceQuery,
  type DiameterQuery,
  type FinderJudgement,
  type FinderVerdict,
  type LengthQuery,
  type SplineQuery,
} from '../engine/fit-finder';
import { describePitch, type SplinePitch } from '../engine/splines';
import { formatLength, type LengthUnit } from '../engine/units';
import { publicGuidePath } from '../guides/guide.mapper';
import { Mark } from '../marks/entities/mark.entity';
import { Measurement } from '../measurements/entities/measurement.entity';
import type { DiameterSpec, FeatureSpec, LengthSpec, SplineSpec } from '../parts/entities/part-feature.entity';
import { PartFeature } from '../parts/entities/part-feature.entity';
import { Part, partNumberKey } from '../parts/entities/part.entity';
import { UsersService } from '../users/users.service';
import type { FinderCheckDto, FinderMeasurementDto, FitFinderAnswerDto, FitFinderQueryDto, FitFinderResultDto } from './dto/fit-finder.dto';

type Criterion = FinderCheckDto['criterion'];
type FeatureCriterion = Exclude<Criterion, 'part'>;

interface ParsedQuery {
  understood: string[];
  spline?: SplineQuery;
  diameter?: DiameterQuery;
  clearance?: ClearanceQuery;
  length?: LengthQuery;
  partNumberKey?: string;
  maker?: string;
  vehicle?: string;
  limit: number;
  offset: number;
}

/** What ranking needs of a published guide; the rest (title, slug, workshop) is read for the page only. */
interface GuideFacts {
  guideId: string;
  assemblyId: string;
  publishedAt: Date;
  vehicle: string;
}

/** A published guide on the page, with what the result shows of it. */
interface GuideRow extends GuideFacts {
  guideSlug: string;
  title: string;
  revision: number;
  footageId: string | null;
  workshopId: string;
  workshopName: string;
  workshopSlug: string;
  showMemberNames: number;
  assemblyName: string;
  buildTitle: string;
}

/** The part of a fit check the finder judges, ranks and shows. */
interface CheckFacts {
  id: string;
  title: string;
  state: string;
  confirmedAt: Date | null;
  confirmedBy: string | null;
  interfaceId: string | null;
}

interface FeatureFacts {
  id: string;
  kind: string;
  name: string;
  spec: FeatureSpec;
  partNumber: string;
}

/** One interface of a published assembly that may answer a criterion: both its features and its check, as the engine needs them. */
interface CandidateInterface {
  id: string;
  kind: string;
  name: string;
  features: FeatureFacts[];
  check: CheckFacts | null;
  checkDetail: Record<string, unknown> | null;
}

/** A raw candidate row of featureInterfacesSql. */
interface CandidateRow extends GuideFacts {
  interfaceId: string;
  interfaceKind: string;
  interfaceName: string;
  featureAId: string | null;
  featureAKind: string | null;
  featureAName: string | null;
  featureASpec: unknown;
  featureAPart: string | null;
  featureBId: string | null;
  featureBKind: string | null;
  featureBName: string | null;
  featureBSpec: unknown;
  featureBPart: string | null;
  checkId: string | null;
  checkTitle: string | null;
  checkState: string | null;
  checkConfirmedAt: Date | null;
  checkConfirmedBy: string | null;
  checkDetail: unknown;
}

interface Hit extends FinderJudgement {
  criterion: Criterion;
  check: CheckFacts | null;
  interfaceId: string | null;
}

/**
 * Which candidates a statement brings: `match` those that can match (narrowed by every keyed attribute a
 * match needs), `near` the deliberately wider window for near misses ("same teeth, other pitch"), `both`
 * a window holding either (a size window), `text` a part-number or maker filter.
 */
type Window = 'match' | 'near' | 'both' | 'text';

interface Statement {
  criterion: FeatureCriterion | 'text';
  window: Window;
  sql: string;
  parameters: unknown[];
  /** The statement's LIMIT: a window that comes back full may hold more (the answer says so). */
  limit: number;
}

const NEAR_MISS_PAGE = 20;
/** A slip shaft's plunge can reach well past its nominal length; candidates are read this far around the window. */
const LENGTH_SLACK_FRACTION = 0.25;
/**
 * At most this many candidates per criterion are judged, best-ranked first (like the search's counts, which stop
 * at 1,000): the engine's judgement is cheap, but reading and judging every spline of a common tooth count is not
 * bounded. A full window makes `totalCapped` true.
 */
export const FINDER_CANDIDATES = 1_000;
/** Near misses are shown 20 at a time on the first page: a bounded window of them is read, best-ranked first. */
export const FINDER_NEAR_CANDIDATES = 200;
/** At most this many guides are read for a vehicle-only query (it has no key to start from). */
const MAX_VEHICLE_GUIDES = 1000;

/** The engine's state ranking in SQL, so a window keeps its best-ranked candidates (a missing check counts as open). */
const STATE_RANK_SQL = `CASE COALESCE(c.state, 'open') ${Object.entries(FINDER_STATE_RANK)
  .map(([state, rank]) => `WHEN '${state}' THEN ${rank}`)
  .join(' ')} ELSE ${Object.keys(FINDER_STATE_RANK).length} END`;
const CANDIDATE_ORDER = 'ORDER BY stateRank, checkConfirmedAt DESC, publishedAt DESC, guideId, interfaceId';

/*
 * The published assemblies, through the assembly a revision shows (a key on guide_revisions), of
 * workshops not disabled. Drafts and withdrawn guides have no published revision, so they never join.
 */
const PUBLISHED_FROM_INTERFACE = `
JOIN assemblies a ON a.id = i.assembly_id
JOIN guide_revisions r ON r.content_assembly_id = a.id
JOIN guides g ON g.published_revision_id = r.id AND g.workshop_id = a.workshop_id
JOIN workshops w ON w.id = g.workshop_id AND w.disabled_at IS NULL`;

/**
 * Interfaces whose feature of one kind may answer, found by the feature's keyed columns, with what the engine
 * judges them by (both features, their part numbers, the check), best-ranked first and at most `limit`.
 * STRAIGHT_JOIN and the forced foreign-key index keep the written plan (features by key, then each join by key)
 * whatever the tables' sizes and statistics: with a few rows, or statistics not yet refreshed, the optimizer
 * would otherwise scan the interfaces, a plan that does not grow with them.
 */
function featureInterfacesSql(where: string, interfaceKind: string, limit: number, options: { detail: boolean; vehicle: boolean }): string {
  const feature = (alias: 'fa' | 'fb', part: 'pa' | 'pb', name: 'A' | 'B') =>
    `${alias}.id AS feature${name}Id, ${alias}.kind AS feature${name}Kind, ${alias}.name AS feature${name}Name, ${alias}.spec AS feature${name}Spec, ${part}.part_number AS feature${name}Part`;
  const side = (featureSide: 'feature_a' | 'feature_b') => `(
    SELECT STRAIGHT_JOIN g.id AS guideId, a.id AS assemblyId, r.published_at AS publishedAt, b.vehicle AS vehicle,
      i.id AS interfaceId, i.kind AS interfaceKind, i.name AS interfaceName, ${feature('fa', 'pa', 'A')}, ${feature('fb', 'pb', 'B')},
      c.id AS checkId, c.title AS checkTitle, c.state AS checkState, c.confirmed_at AS checkConfirmedAt, c.confirmed_by AS checkConfirmedBy,
      ${options.detail ? 'c.detail' : 'NULL'} AS checkDetail, ${STATE_RANK_SQL} AS stateRank
    FROM part_features f
    JOIN assembly_interfaces i FORCE INDEX (fk_interfaces_${featureSide}) ON i.${featureSide}_id = f.id AND i.kind = '${interfaceKind}'
    ${PUBLISHED_FROM_INTERFACE}
    JOIN builds b ON b.id = g.build_id
    LEFT JOIN part_features fa ON fa.id = i.feature_a_id
    LEFT JOIN parts pa ON pa.id = fa.part_id
    LEFT JOIN part_features fb ON fb.id = i.feature_b_id
    LEFT JOIN parts pb ON pb.id = fb.part_id
    LEFT JOIN fit_checks c ON c.interface_id = i.id
    WHERE ${where}${options.vehicle ? ' AND b.vehicle LIKE ?' : ''}
    ${CANDIDATE_ORDER} LIMIT ${limit})`;
  return `${side('feature_a')} UNION ${side('feature_b')} ${CANDIDATE_ORDER} LIMIT ${limit}`;
}

/** The pitch as the part_features.spline_pitch_key column writes it (migration 1765486000000). */
function splinePitchKey(pitch: SplinePitch): string {
  return pitch.system === 'diametral' ? `dp${pitch.diametralPitch.toFixed(6)}` : `m${pitch.moduleMm.toFixed(6)}`;
}

/**
 * The fit finder's read model: across every published guide, the assemblies whose checks answer what
 * a reader has, judged by the engine's rules (engine/fit-finder.ts), never by text similarity. Checks
 * are live (as on the follow-along page); only published guides of enabled workshops take part.
 *
 * Bounded work per question: keyed SQL narrows the candidates (spline teeth and pitch, a size window, part
 * number or maker), each window reads at most its best-ranked FINDER_CANDIDATES (near misses:
 * FINDER_NEAR_CANDIDATES) with just what the engine needs, the engine judges those, and the details (guide,
 * readings, names, fit reports, evidence moments) are read for the returned page only.
 */
@Injectable()
export class FitFinderService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly users: UsersService,
  ) {}

  async find(dto: FitFinderQueryDto): Promise<FitFinderAnswerDto> {
    const query = parseQuery(dto);
    const candidates = await this.candidates(query);
    const judged = await this.judge(query, candidates);

    const rank = (entry: JudgedGuide) => Math.max(...entry.hits.map((hit) => finderStateRank(hit.check?.state ?? 'open')));
    const latestConfirmed = (entry: JudgedGuide) => Math.max(0, ...entry.hits.map((hit) => hit.check?.confirmedAt?.getTime() ?? 0));
    judged.sort(
      (a, b) =>
        rank(a) - rank(b) ||
        latestConfirmed(b) - latestConfirmed(a) ||
        b.guide.publishedAt.getTime() - a.guide.publishedAt.getTime() ||
        (a.guide.guideId < b.guide.guideId ? -1 : 1),
    );
    const matches = judged.filter((entry) => entry.verdict === 'match');
    const nearMisses = judged.filter((entry) => entry.verdict === 'near_miss');
    const page = matches.slice(query.offset, query.offset + query.limit);
    const nearPage = query.offset === 0 ? nearMisses.slice(0, Math.min(NEAR_MISS_PAGE, query.limit)) : [];
    const described = await this.describe([...page, ...nearPage]);
    const shownMatches = described.filter((entry) => page.includes(entry.judged)).map((entry) => entry.result);
    return {
      understood: query.understood,
      total: matches.length,
      totalCapped: candidates.matchCapped,
      offset: query.offset,
      limit: query.limit,
      results: shownMatches,
      nearMissTotal: nearMisses.length,
      nearMissCapped: candidates.nearCapped,
      nearMisses: described.filter((entry) => !page.includes(entry.judged)).map((entry) => entry.result),
    };
  }

  /** The candidate statements of a query, for the EXPLAIN tests and the benchmark. */
  candidateStatements(dto: FitFinderQueryDto): Statement[] {
    return this.statements(parseQuery(dto));
  }

  private statements(query: ParsedQuery): Statement[] {
    const statements: Statement[] = [];
    const vehicle = query.vehicle ? [likePattern(query.vehicle)] : [];
    const options = (detail = false) => ({ detail, vehicle: vehicle.length > 0 });
    const both = (parameters: unknown[]) => [...parameters, ...vehicle, ...parameters, ...vehicle];
    if (query.spline) {
      const { teeth, pitch } = query.spline;
      if (pitch) {
        // Only the asked pitch can match; the other pitches of the same teeth (and splines without a pitch) are near misses at best.
        const key = splinePitchKey(pitch);
        statements.push({
          criterion: 'spline',
          window: 'match',
          limit: FINDER_CANDIDATES,
          sql: featureInterfacesSql('f.spline_teeth = ? AND f.spline_pitch_key = ?', 'spline', FINDER_CANDIDATES, options()),
          parameters: both([teeth, key]),
        });
        statements.push({
          criterion: 'spline',
          window: 'near',
          limit: FINDER_NEAR_CANDIDATES,
          sql: featureInterfacesSql('f.spline_teeth = ? AND (f.spline_pitch_key IS NULL OR f.spline_pitch_key <> ?)', 'spline', FINDER_NEAR_CANDIDATES, options()),
          parameters: both([teeth, key]),
        });
      } else {
        statements.push({
          criterion: 'spline',
          window: 'both',
          limit: FINDER_CANDIDATES,
          sql: featureInterfacesSql('f.spline_teeth = ?', 'spline', FINDER_CANDIDATES, options()),
          parameters: both([teeth]),
        });
      }
    }
    const diameterNm = query.diameter?.sizeNm ?? query.clearance?.nominalNm;
    if (diameterNm !== undefined) {
      // The near-size window (2 %, at least 0.5 mm) holds every match and every near miss the engine can name.
      const near = nearSizeWindowNm(diameterNm);
      statements.push({
        criterion: query.clearance ? 'clearance' : 'diameter',
        window: 'both',
        limit: FINDER_CANDIDATES,
        sql: featureInterfacesSql("f.kind = 'diameter' AND f.size_nm BETWEEN ? AND ?", 'bore_shaft', FINDER_CANDIDATES, options(Boolean(query.clearance))),
        parameters: both([diameterNm - near, diameterNm + near]),
      });
    }
    if (query.length) {
      const low = query.length.minNm ?? query.length.maxNm!;
      const high = query.length.maxNm ?? query.length.minNm!;
      statements.push({
        criterion: 'length',
        window: 'both',
        limit: FINDER_CANDIDATES,
        sql: featureInterfacesSql("f.kind = 'length' AND f.size_nm BETWEEN ? AND ?", 'length_window', FINDER_CANDIDATES, options()),
        parameters: both([Math.floor(low * (1 - LENGTH_SLACK_FRACTION)), Math.ceil(high * (1 + LENGTH_SLACK_FRACTION))]),
      });
    }
    const partWhere: string[] = [];
    const partParameters: unknown[] = [];
    if (query.partNumberKey) {
      partWhere.push('p.part_number_key = ?');
      partParameters.push(query.partNumberKey);
    }
    if (query.maker) {
      partWhere.push('p.maker = ?');
      partParameters.push(query.maker);
    }
    if (query.vehicle && partWhere.length > 0) {
      partWhere.push('b.vehicle LIKE ?');
      partParameters.push(...vehicle);
    }
    if (partWhere.length > 0) {
      statements.push({
        criterion: 'text',
        window: 'text',
        limit: FINDER_CANDIDATES,
        sql: `SELECT DISTINCT STRAIGHT_JOIN g.id AS guideId, a.id AS assemblyId, r.published_at AS publishedAt, b.vehicle AS vehicle
          FROM parts p
          JOIN assembly_parts ap ON ap.part_id = p.id
          JOIN assemblies a ON a.id = ap.assembly_id
          JOIN guide_revisions r ON r.content_assembly_id = a.id
          JOIN guides g ON g.published_revision_id = r.id AND g.workshop_id = a.workshop_id
          JOIN workshops w ON w.id = g.workshop_id AND w.disabled_at IS NULL
          JOIN builds b ON b.id = g.build_id
          WHERE ${partWhere.join(' AND ')}
          ORDER BY r.published_at DESC, g.id
          LIMIT ${FINDER_CANDIDATES}`,
        parameters: partParameters,
      });
    }
    return statements;
  }

  /** Runs the statements: the candidate guides (every feature criterion answered in one assembly) with their interfaces. */
  private async candidates(query: ParsedQuery) {
    const statements = this.statements(query);
    const answers = await Promise.all(statements.map((statement) => this.dataSource.query<(CandidateRow & GuideFacts)[]>(statement.sql, statement.parameters)));
    const facts = new Map<string, GuideFacts>();
    const interfacesByGuide = new Map<string, Map<string, CandidateInterface>>();
    const guidesByCriterion = new Map<FeatureCriterion, Set<string>>();
    let textAllowed: Set<string> | null = null;
    let matchCapped = false;
    let nearCapped = false;
    statements.forEach((statement, index) => {
      const rows = answers[index];
      if (rows.length >= statement.limit) {
        if (statement.window !== 'near') matchCapped = true;
        if (statement.window === 'near' || statement.window === 'both') nearCapped = true;
      }
      for (const row of rows) {
        if (!facts.has(row.guideId)) facts.set(row.guideId, { guideId: row.guideId, assemblyId: row.assemblyId, publishedAt: new Date(row.publishedAt), vehicle: row.vehicle });
      }
      if (statement.criterion === 'text') {
        textAllowed = new Set(rows.map((row) => row.guideId));
        return;
      }
      const guides = guidesByCriterion.get(statement.criterion) ?? new Set<string>();
      guidesByCriterion.set(statement.criterion, guides);
      for (const row of rows) {
        guides.add(row.guideId);
        const own = interfacesByGuide.get(row.guideId) ?? new Map<string, CandidateInterface>();
        interfacesByGuide.set(row.guideId, own);
        if (!own.has(row.interfaceId)) own.set(row.interfaceId, toCandidateInterface(row));
      }
    });
    let guideIds: string[];
    if (guidesByCriterion.size > 0) {
      // Every feature criterion must be answered by the same guide's assembly.
      const sets = [...guidesByCriterion.values()];
      guideIds = [...sets[0]].filter((id) => sets.every((set) => set.has(id)) && (textAllowed === null || (textAllowed as Set<string>).has(id)));
    } else if (textAllowed !== null) {
      guideIds = [...(textAllowed as Set<string>)];
    } else {
      const rows = await this.vehicleGuides(query.vehicle!);
      matchCapped = rows.length >= MAX_VEHICLE_GUIDES;
      for (const row of rows) facts.set(row.guideId, { ...row, publishedAt: new Date(row.publishedAt) });
      guideIds = rows.map((row) => row.guideId);
    }
    return { guides: guideIds.map((id) => facts.get(id)!), interfacesByGuide, matchCapped, nearCapped };
  }

  private vehicleGuides(vehicle: string) {
    return this.dataSource.query<GuideFacts[]>(
      `SELECT g.id AS guideId, a.id AS assemblyId, r.published_at AS publishedAt, b.vehicle AS vehicle FROM guides g
       JOIN workshops w ON w.id = g.workshop_id AND w.disabled_at IS NULL
       JOIN builds b ON b.id = g.build_id
       JOIN guide_revisions r ON r.id = g.published_revision_id
       JOIN assemblies a ON a.id = r.content_assembly_id AND a.workshop_id = g.workshop_id
       WHERE g.published_revision_id IS NOT NULL AND b.vehicle LIKE ?
       LIMIT ${MAX_VEHICLE_GUIDES}`,
      [likePattern(vehicle)],
    );
  }

  /** The page's guides, with what a result shows of them. */
  private async guideRows(guideIds: string[]): Promise<GuideRow[]> {
    if (guideIds.length === 0) return [];
    return this.dataSource.query<GuideRow[]>(
      `SELECT g.id AS guideId, g.slug AS guideSlug, JSON_VALUE(r.content, '$.title') AS title, r.number AS revision,
              r.published_at AS publishedAt, JSON_VALUE(r.content, '$.footageId') AS footageId,
              w.id AS workshopId, w.name AS workshopName, w.slug AS workshopSlug, w.show_member_names AS showMemberNames,
              a.id AS assemblyId, a.name AS assemblyName, b.title AS buildTitle, b.vehicle AS vehicle
       FROM guides g
       JOIN guide_revisions r ON r.id = g.published_revision_id
       JOIN workshops w ON w.id = g.workshop_id AND w.disabled_at IS NULL
       JOIN assemblies a ON a.id = r.content_assembly_id AND a.workshop_id = g.workshop_id
       JOIN builds b ON b.id = g.build_id
       WHERE g.id IN (?)`,
      [guideIds],
    );
  }

  /** Diameter readings of the candidate features (what a measured diameter is judged by). */
  private async diameterReadings(interfaces: CandidateInterface[]): Promise<Map<string, number[]>> {
    const featureIds = [...new Set(interfaces.filter((item) => item.kind === 'bore_shaft').flatMap((item) => item.features.filter((f) => f.kind === 'diameter').map((f) => f.id)))];
    const byFeature = new Map<string, number[]>();
    if (featureIds.length === 0) return byFeature;
    const rows = await this.dataSource.query<{ featureId: string; valueNm: string | number }[]>(
      `SELECT feature_id AS featureId, value_nm AS valueNm FROM measurements WHERE feature_id IN (?) AND quantity = 'diameter'`,
      [featureIds],
    );
    for (const row of rows) byFeature.set(row.featureId, [...(byFeature.get(row.featureId) ?? []), Number(row.valueNm)]);
    return byFeature;
  }

  /** The live checks of the candidate assemblies, for a part-number, maker or vehicle question. */
  private async assemblyChecks(assemblyIds: string[]): Promise<Map<string, (CheckFacts & { assemblyId: string })[]>> {
    const byAssembly = new Map<string, (CheckFacts & { assemblyId: string })[]>();
    if (assemblyIds.length === 0) return byAssembly;
    const rows = await this.dataSource.query<(CheckFacts & { assemblyId: string })[]>(
      `SELECT id, assembly_id AS assemblyId, interface_id AS interfaceId, title, state, confirmed_at AS confirmedAt, confirmed_by AS confirmedBy
       FROM fit_checks WHERE assembly_id IN (?) AND state <> 'retired'`,
      [assemblyIds],
    );
    for (const row of rows) byAssembly.set(row.assemblyId, [...(byAssembly.get(row.assemblyId) ?? []), { ...row, confirmedAt: row.confirmedAt ? new Date(row.confirmedAt) : null }]);
    return byAssembly;
  }

  private async judge(query: ParsedQuery, candidates: { guides: GuideFacts[]; interfacesByGuide: Map<string, Map<string, CandidateInterface>> }): Promise<JudgedGuide[]> {
    const vehicleWords = query.vehicle?.toLowerCase();
    const kept = candidates.guides.filter((guide) => !vehicleWords || guide.vehicle.toLowerCase().includes(vehicleWords));
    const interfacesOf = (guide: GuideFacts) => [...(candidates.interfacesByGuide.get(guide.guideId)?.values() ?? [])];
    const readings = query.diameter ? await this.diameterReadings(kept.flatMap(interfacesOf)) : new Map<string, number[]>();
    const hasFeatureCriterion = Boolean(query.spline || query.diameter || query.clearance || query.length);
    const checksByAssembly = hasFeatureCriterion ? new Map() : await this.assemblyChecks([...new Set(kept.map((guide) => guide.assemblyId))]);
    const label = (feature: FeatureFacts) => `${feature.partNumber} ${feature.name}`.trim();

    const judged: JudgedGuide[] = [];
    for (const guide of kept) {
      const hits: Hit[] = [];
      const mine = interfacesOf(guide);
      const best = (criterion: Criterion, judgements: { judgement: FinderJudgement; item: CandidateInterface }[]) => {
        let chosen: Hit | null = null;
        for (const { judgement, item } of judgements) {
          if (judgement.verdict === 'no_match' || item.check?.state === 'retired') continue;
          const hit: Hit = { ...judgement, criterion, check: item.check, interfaceId: item.id };
          if (!chosen || verdictRank(hit.verdict) < verdictRank(chosen.verdict) || (hit.verdict === chosen.verdict && stateRankOf(hit) < stateRankOf(chosen))) {
            chosen = hit;
          }
        }
        return chosen;
      };
      const criteria: (Hit | null)[] = [];
      if (query.spline) {
        const spline = query.spline;
        criteria.push(
          best(
            'spline',
            mine.filter((item) => item.kind === 'spline').flatMap((item) =>
              item.features
                .filter((feature) => feature.kind === 'spline')
                .map((feature) => ({ item, judgement: judgeSpline(spline, recordedSpline(label(feature), feature.spec as SplineSpec)) })),
            ),
          ),
        );
      }
      if (query.diameter) {
        const diameter = query.diameter;
        criteria.push(
          best(
            'diameter',
            mine.filter((item) => item.kind === 'bore_shaft').flatMap((item) =>
              item.features
                .filter((feature) => feature.kind === 'diameter')
                .map((feature) => {
                  const spec = feature.spec as DiameterSpec;
                  const readingsNm = readings.get(feature.id) ?? [];
                  return {
                    item,
                    judgement: judgeDiameter(diameter, { name: label(feature), role: spec.role, nominalNm: spec.nominalNm, toleranceClass: spec.toleranceClass, maxNm: spec.maxNm, minNm: spec.minNm, readingsNm }),
                  };
                }),
            ),
          ),
        );
      }
      if (query.clearance) {
        const clearance = query.clearance;
        criteria.push(
          best(
            'clearance',
            mine.filter((item) => item.kind === 'bore_shaft').flatMap((item) => {
              const detail = item.checkDetail;
              const hole = item.features.find((feature) => (feature.spec as DiameterSpec).role === 'hole');
              if (!detail || !hole || typeof detail.clearanceMinNm !== 'number' || typeof detail.clearanceMaxNm !== 'number') return [];
              const measured = isMeasured(detail.hole) && isMeasured(detail.shaft);
              return [
                {
                  item,
                  judgement: judgeClearance(clearance, {
                    name: item.name,
                    nominalNm: (hole.spec as DiameterSpec).nominalNm,
                    clearanceMinNm: detail.clearanceMinNm,
                    clearanceMaxNm: detail.clearanceMaxNm,
                    measured,
                  }),
                },
              ];
            }),
          ),
        );
      }
      if (query.length) {
        const length = query.length;
        criteria.push(
          best(
            'length',
            mine.filter((item) => item.kind === 'length_window').flatMap((item) =>
              item.features
                .filter((feature) => feature.kind === 'length')
                .map((feature) => {
                  const spec = feature.spec as LengthSpec;
                  return { item, judgement: judgeLength(length, { name: label(feature), lengthNm: spec.lengthNm, compressedNm: spec.compressedNm, extendedNm: spec.extendedNm }) };
                }),
            ),
          ),
        );
      }
      if (criteria.length === 0) {
        hits.push(this.partHit(query, guide, checksByAssembly.get(guide.assemblyId) ?? []));
      } else {
        if (criteria.some((hit) => hit === null)) continue;
        hits.push(...(criteria as Hit[]));
      }
      const verdict: FinderVerdict = hits.every((hit) => hit.verdict === 'match') ? 'match' : 'near_miss';
      judged.push({ guide, hits, verdict });
    }
    return judged;
  }

  /** A part-number, maker or vehicle query: the assembly's best check stands for it (confirmed first). */
  private partHit(query: ParsedQuery, guide: GuideFacts, checks: CheckFacts[]): Hit {
    const own = [...checks].sort((a, b) => finderStateRank(a.state) - finderStateRank(b.state));
    const reasons: string[] = [];
    if (query.partNumberKey || query.maker) reasons.push(`in this assembly: ${query.understood.filter((line) => line.startsWith('part') || line.startsWith('maker')).join(', ')}`);
    if (query.vehicle) reasons.push(`vehicle: ${guide.vehicle}`);
    return { criterion: 'part', verdict: 'match', reasons, check: own[0] ?? null, interfaceId: own[0]?.interfaceId ?? null };
  }

  /** The shown details of the page only: the guide, readings with units, evidence moments, names and fit reports. */
  private async describe(entries: JudgedGuide[]): Promise<{ judged: JudgedGuide; result: FitFinderResultDto }[]> {
    if (entries.length === 0) return [];
    const guideById = new Map((await this.guideRows(entries.map((entry) => entry.guide.guideId))).map((row) => [row.guideId, row]));
    // A guide withdrawn between the two reads is left out rather than shown half.
    const shown = entries.filter((entry) => guideById.has(entry.guide.guideId));
    if (shown.length === 0) return [];
    const manager = this.dataSource.manager;
    const hits = shown.flatMap((entry) => entry.hits);
    const checkIds = hits.map((hit) => hit.check?.id).filter((id): id is string => !!id);
    const interfaceIds = hits.map((hit) => hit.interfaceId).filter((id): id is string => !!id);
    const interfaces = interfaceIds.length ? await manager.findBy(AssemblyInterface, { id: In(interfaceIds) }) : [];
    const featureIds = interfaces.flatMap((item) => [item.featureAId, item.featureBId].filter((id): id is string => !!id));
    const evidence = checkIds.length ? await manager.findBy(FitCheckEvidence, { fitCheckId: In(checkIds) }) : [];
    const evidenceMeasurementIds = evidence.map((item) => item.measurementId).filter((id): id is string => !!id);
    // One keyed statement per condition: an OR across columns may be planned as a scan of the whole table.
    const measurements = (
      await anyOf<Measurement>([
        featureIds.length ? () => manager.findBy(Measurement, { featureId: In(featureIds) }) : null,
        interfaceIds.length ? () => manager.findBy(Measurement, { interfaceId: In(interfaceIds) }) : null,
        evidenceMeasurementIds.length ? () => manager.findBy(Measurement, { id: In(evidenceMeasurementIds) }) : null,
      ])
    ).sort((a, b) => a.takenAt.getTime() - b.takenAt.getTime());
    const markIds = evidence.map((item) => item.markId).filter((id): id is string => !!id);
    const marks = await anyOf<Mark>([
      markIds.length ? () => manager.findBy(Mark, { id: In(markIds) }) : null,
      checkIds.length ? () => manager.findBy(Mark, { fitCheckId: In(checkIds) }) : null,
    ]);
    const features = featureIds.length ? await manager.findBy(PartFeature, { id: In(featureIds) }) : [];
    const measuredFeatureIds = measurements.map((item) => item.featureId).filter((id): id is string => !!id);
    const allFeatures = [...features, ...(measuredFeatureIds.some((id) => !features.find((f) => f.id === id)) ? await manager.findBy(PartFeature, { id: In(measuredFeatureIds) }) : [])];
    const parts = allFeatures.length ? await manager.findBy(Part, { id: In([...new Set(allFeatures.map((feature) => feature.partId))]) }) : [];
    const names = await this.users.displayNames(
      shown
        .filter((entry) => Number(guideById.get(entry.guide.guideId)!.showMemberNames) === 1)
        .flatMap((entry) => entry.hits.map((hit) => hit.check?.confirmedBy).filter((id): id is string => !!id)),
    );
    const reports = await this.dataSource.query<{ guideId: string; outcome: string; count: string }[]>(
      `SELECT guide_id AS guideId, outcome, COUNT(*) AS count FROM fit_reports
       WHERE guide_id IN (?) AND status <> 'declined' GROUP BY guide_id, outcome`,
      [shown.map((entry) => entry.guide.guideId)],
    );
    const featureLabel = (featureId: string | null) => {
      const feature = allFeatures.find((item) => item.id === featureId);
      if (!feature) return 'across the interface';
      return `${parts.find((part) => part.id === feature.partId)?.partNumber ?? ''} ${feature.name}`.trim();
    };

    return shown.map((judged) => {
      const { hits, verdict } = judged;
      const guide = guideById.get(judged.guide.guideId)!;
      const checks: FinderCheckDto[] = hits.map((hit) => {
        const item = interfaces.find((candidate) => candidate.id === hit.interfaceId);
        const ownFeatures = item ? [item.featureAId, item.featureBId] : [];
        const ownEvidence = evidence.filter((entry) => entry.fitCheckId === hit.check?.id);
        const readings = measurements.filter(
          (reading) =>
            (reading.featureId !== null && ownFeatures.includes(reading.featureId)) ||
            (item && reading.interfaceId === item.id) ||
            ownEvidence.some((entry) => entry.measurementId === reading.id),
        );
        const moments = [
          ...marks
            .filter((mark) => mark.footageId === guide.footageId && (mark.fitCheckId === hit.check?.id || ownEvidence.some((entry) => entry.markId === mark.id)))
            .map((mark) => mark.startMs),
          ...readings
            .filter((reading) => reading.footageId === guide.footageId && reading.footageTimeMs !== null && ownEvidence.some((entry) => entry.measurementId === reading.id))
            .map((reading) => reading.footageTimeMs!),
        ];
        const check = hit.check;
        return {
          id: check?.id ?? '',
          title: check?.title ?? item?.name ?? 'No check recorded yet',
          criterion: hit.criterion,
          state: check?.state ?? 'open',
          verdict: hit.verdict === 'no_match' ? 'near_miss' : hit.verdict,
          reasons: hit.reasons,
          measurements: readings.slice(0, 12).map((reading) => toMeasurement(reading, featureLabel(reading.featureId))),
          confirmedAt: check?.confirmedAt?.toISOString() ?? null,
          confirmedBy: check?.confirmedBy && Number(guide.showMemberNames) === 1 ? (names.get(check.confirmedBy) ?? null) : null,
          evidenceAtSeconds: moments.length > 0 ? Math.min(...moments) / 1000 : null,
        };
      });
      const path = publicGuidePath(guide.workshopSlug, guide.guideSlug);
      const moment = checks.find((check) => check.evidenceAtSeconds !== null)?.evidenceAtSeconds ?? null;
      const worst = checks.reduce((state, check) => (finderStateRank(check.state) > finderStateRank(state) ? check.state : state), 'confirmed');
      const count = (outcome: string) => Number(reports.find((row) => row.guideId === guide.guideId && row.outcome === outcome)?.count ?? 0);
      const result: FitFinderResultDto = {
        verdict: verdict === 'no_match' ? 'near_miss' : verdict,
        state: worst,
        workshop: { name: guide.workshopName, slug: guide.workshopSlug },
        guide: { title: guide.title, slug: guide.guideSlug, path, revision: Number(guide.revision), publishedAt: new Date(guide.publishedAt).toISOString() },
        buildTitle: guide.buildTitle,
        vehicle: guide.vehicle,
        assembly: guide.assemblyName,
        checks,
        fitReports: { fit: count('fit'), noFit: count('no_fit') },
        link: moment === null ? path : `${path}?t=${moment.toFixed(1)}`,
      };
      return { judged, result };
    });
  }
}

interface JudgedGuide {
  guide: GuideFacts;
  hits: Hit[];
  verdict: FinderVerdict;
}

function verdictRank(verdict: FinderVerdict): number {
  return verdict === 'match' ? 0 : verdict === 'near_miss' ? 1 : 2;
}

function stateRankOf(hit: Hit): number {
  return finderStateRank(hit.check?.state ?? 'open');
}

/** The rows any of the reads find, each once. */
async function anyOf<T extends { id: string }>(reads: (null | (() => Promise<T[]>))[]): Promise<T[]> {
  const byId = new Map<string, T>();
  for (const read of reads) if (read) for (const row of await read()) byId.set(row.id, row);
  return [...byId.values()];
}

/** A JSON column as the driver hands it over: parsed already, or as text (MariaDB keeps JSON as text). */
function jsonValue<T>(value: unknown): T | null {
  if (value === null || value === undefined) return null;
  return (typeof value === 'string' ? JSON.parse(value) : value) as T;
}

function toCandidateInterface(row: CandidateRow): CandidateInterface {
  const features: FeatureFacts[] = [];
  if (row.featureAId) features.push({ id: row.featureAId, kind: row.featureAKind!, name: row.featureAName!, spec: jsonValue<FeatureSpec>(row.featureASpec)!, partNumber: row.featureAPart ?? '' });
  if (row.featureBId) features.push({ id: row.featureBId, kind: row.featureBKind!, name: row.featureBName!, spec: jsonValue<FeatureSpec>(row.featureBSpec)!, partNumber: row.featureBPart ?? '' });
  const check: CheckFacts | null = row.checkId
    ? {
        id: row.checkId,
        title: row.checkTitle ?? '',
        state: row.checkState ?? 'open',
        confirmedAt: row.checkConfirmedAt ? new Date(row.checkConfirmedAt) : null,
        confirmedBy: row.checkConfirmedBy,
        interfaceId: row.interfaceId,
      }
    : null;
  return { id: row.interfaceId, kind: row.interfaceKind, name: row.interfaceName, features, check, checkDetail: jsonValue<Record<string, unknown>>(row.checkDetail) };
}

function isMeasured(side: unknown): boolean {
  return typeof side === 'object' && side !== null && (side as { source?: unknown }).source === 'measured';
}

function likePattern(words: string): string {
  return `%${words.trim().replace(/[\\%_]/g, (match) => `\\${match}`)}%`;
}

function recordedSpline(name: string, spec: SplineSpec) {
  let pitch: SplinePitch | null = null;
  if (spec.diametralPitch !== undefined) pitch = { system: 'diametral', diametralPitch: spec.diametralPitch, stubPitch: spec.stubPitch };
  else if (spec.module !== undefined) pitch = { system: 'module', moduleMm: spec.module };
  return { name, teeth: spec.teeth, gender: spec.gender, pitch, pressureAngleDeg: spec.pressureAngle ?? null, fit: spec.fit ?? null };
}

function toMeasurement(reading: Measurement, feature: string): FinderMeasurementDto {
  return {
    feature,
    value: formatLength(reading.valueNm, reading.unit, reading.instrumentResolutionNm),
    unit: reading.unit,
    millimetres: reading.valueNm / 1_000_000,
    instrument: reading.instrumentKind,
    takenAt: reading.takenAt.toISOString(),
  };
}

/** Reads the query into engine terms; anything unreadable is a 400 naming its field (EngineError). */
function parseQuery(dto: FitFinderQueryDto): ParsedQuery {
  const unit = dto.unit;
  const understood: string[] = [];
  const parsed: ParsedQuery = { understood, limit: dto.limit ?? 20, offset: dto.offset ?? 0 };
  const text = (value: string | undefined) => (value && value.trim() ? value.trim() : undefined);

  if (dto.splineTeeth !== undefined) {
    const pitchText = text(dto.splinePitch);
    const pitch = pitchText ? readFinderPitch('splinePitch', pitchText) : undefined;
    parsed.spline = { teeth: dto.splineTeeth, pitch, pressureAngleDeg: dto.pressureAngle, fit: dto.splineFit };
    const words = [`${dto.splineTeeth} teeth`, pitch ? describePitch(pitch) : null, dto.pressureAngle ? `${dto.pressureAngle}° pressure angle` : null, dto.splineFit ? `${dto.splineFit} fit` : null];
    understood.push(`spline: ${words.filter(Boolean).join(', ')}`);
  } else if (text(dto.splinePitch) || dto.pressureAngle !== undefined || dto.splineFit) {
    throw new BadRequestException({ message: 'splineTeeth: give the tooth count with a spline pitch, pressure angle or fit', errors: { splineTeeth: 'required with the other spline fields' } });
  }

  const diameterText = text(dto.diameter);
  if (diameterText) {
    const { nm, unit: written } = readFinderLength('diameter', diameterText, unit);
    if (dto.fit && dto.toleranceClass) {
      throw new BadRequestException({ message: 'fit: give the diameter a tolerance class or a fit to check clearances against, not both', errors: { fit: 'not with toleranceClass' } });
    }
    if (dto.fit) {
      const [hole, shaft] = dto.fit.split('/');
      parsed.clearance = { nominalNm: nm, unit: written, hole, shaft };
      understood.push(`bore and shaft at ${showFinderLength(nm, written)}: clearance within ${dto.fit} (ISO 286)`);
    } else {
      parsed.diameter = { sizeNm: nm, unit: written, toleranceClass: dto.toleranceClass };
      understood.push(dto.toleranceClass ? `diameter ${showFinderLength(nm, written)} ${dto.toleranceClass} (ISO 286)` : `diameter measured ${showFinderLength(nm, written)}`);
    }
  } else if (dto.toleranceClass || dto.fit) {
    throw new BadRequestException({ message: 'diameter: give the size the tolerance class or fit applies to', errors: { diameter: 'required with toleranceClass or fit' } });
  }

  const minText = text(dto.lengthMin);
  const maxText = text(dto.lengthMax);
  if (minText || maxText) {
    const min = minText ? readFinderLength('lengthMin', minText, unit) : undefined;
    const max = maxText ? readFinderLength('lengthMax', maxText, unit) : undefined;
    if (min && max && min.nm > max.nm) {
      throw new BadRequestException({ message: 'lengthMin must not exceed lengthMax', errors: { lengthMin: 'longer than lengthMax' } });
    }
    const shownUnit: LengthUnit = (min ?? max)!.unit;
    parsed.length = { minNm: min?.nm, maxNm: max?.nm, unit: shownUnit };
    understood.push(`length ${min ? `from ${showFinderLength(min.nm, shownUnit)}` : ''}${min && max ? ' ' : ''}${max ? `up to ${showFinderLength(max.nm, shownUnit)}` : ''}`);
  }

  const partText = text(dto.partNumber);
  if (partText) {
    const key = partNumberKey(partText);
    if (!key) throw new BadRequestException({ message: 'partNumber must contain a letter or digit', errors: { partNumber: 'no letters or digits' } });
    parsed.partNumberKey = key;
    understood.push(`part number ${partText}`);
  }
  const maker = text(dto.maker);
  if (maker) {
    parsed.maker = maker;
    understood.push(`maker ${maker}`);
  }
  const vehicle = text(dto.vehicle);
  if (vehicle) {
    parsed.vehicle = vehicle;
    understood.push(`vehicle ${vehicle}`);
  }
  if (understood.length === 0) {
    throw new BadRequestException({
      message: 'Describe what you have: a part number or maker, a vehicle, a spline (splineTeeth), a diameter or a length window',
      errors: { splineTeeth: 'or partNumber, maker, vehicle, diameter, lengthMin, lengthMax' },
    });
  }
  return parsed;
}
