import { BadRequestException, Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { DataSource, In } from 'typeorm';
import { AssemblyInterface } from '../assemblies/entities/assembly-interface.entity';
import { FitCheckEvidence } from '../fit-checks/entities/fit-check-evidence.entity';
import { FitCheck } from '../fit-checks/entities/fit-check.entity';
import {
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
import type { DiameterSpec, LengthSpec, SplineSpec } from '../parts/entities/part-feature.entity';
import { PartFeature } from '../parts/entities/part-feature.entity';
import { Part, partNumberKey } from '../parts/entities/part.entity';
import { UsersService } from '../users/users.service';
import type { FinderCheckDto, FinderMeasurementDto, FitFinderAnswerDto, FitFinderQueryDto, FitFinderResultDto } from './dto/fit-finder.dto';

type Criterion = FinderCheckDto['criterion'];

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

/** A published guide whose assembly may answer the query (the revision fixes which assembly). */
interface GuideRow {
  guideId: string;
  guideSlug: string;
  title: string;
  revision: number;
  publishedAt: Date;
  footageId: string | null;
  workshopId: string;
  workshopName: string;
  workshopSlug: string;
  showMemberNames: number;
  assemblyId: string;
  assemblyName: string;
  buildTitle: string;
  vehicle: string;
}

interface Hit extends FinderJudgement {
  criterion: Criterion;
  check: FitCheck | null;
  interfaceId: string | null;
}

const NEAR_MISS_PAGE = 20;
/** A slip shaft's plunge can reach well past its nominal length; candidates are read this far around the window. */
const LENGTH_SLACK_FRACTION = 0.25;

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
 * Features of one kind that may answer, found by their keyed column, and the interfaces they sit in (either side).
 * STRAIGHT_JOIN and the forced foreign-key index keep the written plan (features by key, then each join by key)
 * whatever the tables' sizes and statistics: with a few rows, or statistics not yet refreshed, the optimizer
 * would otherwise scan the interfaces, a plan that does not grow with them.
 */
function featureInterfacesSql(where: string, interfaceKind: string): string {
  const side = (featureSide: 'feature_a' | 'feature_b') => `
    SELECT STRAIGHT_JOIN g.id AS guideId, i.id AS interfaceId, f.id AS featureId
    FROM part_features f
    JOIN assembly_interfaces i FORCE INDEX (fk_interfaces_${featureSide}) ON i.${featureSide}_id = f.id AND i.kind = '${interfaceKind}'
    ${PUBLISHED_FROM_INTERFACE}
    WHERE ${where}`;
  return `${side('feature_a')} UNION ${side('feature_b')}`;
}

/**
 * The fit finder's read model: across every published guide, the assemblies whose checks answer what
 * a reader has, judged by the engine's rules (engine/fit-finder.ts), never by text similarity. Checks
 * are live (as on the follow-along page); only published guides of enabled workshops take part.
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
    const guides = await this.guideRows([...candidates.guideIds]);
    const filtered = guides.filter((guide) => candidates.textAllowed === null || candidates.textAllowed.has(guide.guideId));
    const judged = await this.judge(query, filtered, candidates.interfaceIdsByGuide);

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
    return {
      understood: query.understood,
      total: matches.length,
      offset: query.offset,
      limit: query.limit,
      results: described.slice(0, page.length),
      nearMissTotal: nearMisses.length,
      nearMisses: described.slice(page.length),
    };
  }

  /** The plans of the candidate queries, for the EXPLAIN test and the benchmark. */
  candidateStatements(dto: FitFinderQueryDto): { sql: string; parameters: unknown[] }[] {
    return this.statements(parseQuery(dto));
  }

  private statements(query: ParsedQuery): { sql: string; parameters: unknown[]; criterion: Criterion | 'text' }[] {
    const statements: { sql: string; parameters: unknown[]; criterion: Criterion | 'text' }[] = [];
    if (query.spline) {
      statements.push({ criterion: 'spline', sql: featureInterfacesSql('f.spline_teeth = ?', 'spline'), parameters: [query.spline.teeth, query.spline.teeth] });
    }
    const diameterNm = query.diameter?.sizeNm ?? query.clearance?.nominalNm;
    if (diameterNm !== undefined) {
      const near = nearSizeWindowNm(diameterNm);
      const range = [diameterNm - near, diameterNm + near];
      statements.push({
        criterion: query.clearance ? 'clearance' : 'diameter',
        sql: featureInterfacesSql("f.kind = 'diameter' AND f.size_nm BETWEEN ? AND ?", 'bore_shaft'),
        parameters: [...range, ...range],
      });
    }
    if (query.length) {
      const low = query.length.minNm ?? query.length.maxNm!;
      const high = query.length.maxNm ?? query.length.minNm!;
      const range = [Math.floor(low * (1 - LENGTH_SLACK_FRACTION)), Math.ceil(high * (1 + LENGTH_SLACK_FRACTION))];
      statements.push({
        criterion: 'length',
        sql: featureInterfacesSql("f.kind = 'length' AND f.size_nm BETWEEN ? AND ?", 'length_window'),
        parameters: [...range, ...range],
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
    if (partWhere.length > 0) {
      statements.push({
        criterion: 'text',
        sql: `SELECT DISTINCT STRAIGHT_JOIN g.id AS guideId
          FROM parts p
          JOIN assembly_parts ap ON ap.part_id = p.id
          JOIN assemblies a ON a.id = ap.assembly_id
          JOIN guide_revisions r ON r.content_assembly_id = a.id
          JOIN guides g ON g.published_revision_id = r.id AND g.workshop_id = a.workshop_id
          JOIN workshops w ON w.id = g.workshop_id AND w.disabled_at IS NULL
          WHERE ${partWhere.join(' AND ')}`,
        parameters: partParameters,
      });
    }
    return statements;
  }

  private async candidates(query: ParsedQuery) {
    const interfaceIdsByGuide = new Map<string, Set<string>>();
    const featureGuideIds: Set<string>[] = [];
    let textAllowed: Set<string> | null = null;
    for (const statement of this.statements(query)) {
      const rows = await this.dataSource.query<{ guideId: string; interfaceId?: string }[]>(statement.sql, statement.parameters);
      const guideIds = new Set(rows.map((row) => row.guideId));
      if (statement.criterion === 'text') {
        textAllowed = guideIds;
        continue;
      }
      featureGuideIds.push(guideIds);
      for (const row of rows) {
        if (!interfaceIdsByGuide.has(row.guideId)) interfaceIdsByGuide.set(row.guideId, new Set());
        interfaceIdsByGuide.get(row.guideId)!.add(row.interfaceId!);
      }
    }
    let guideIds: Set<string>;
    if (featureGuideIds.length > 0) {
      // Every feature criterion must be answered by the same guide's assembly.
      guideIds = featureGuideIds.reduce((kept, next) => new Set([...kept].filter((id) => next.has(id))));
    } else if (textAllowed !== null) {
      guideIds = textAllowed;
    } else {
      guideIds = new Set((await this.vehicleGuides(query.vehicle!)).map((row) => row.guideId));
    }
    return { guideIds, interfaceIdsByGuide, textAllowed: textAllowed as Set<string> | null };
  }

  private vehicleGuides(vehicle: string) {
    return this.dataSource.query<{ guideId: string }[]>(
      `SELECT g.id AS guideId FROM guides g
       JOIN workshops w ON w.id = g.workshop_id AND w.disabled_at IS NULL
       JOIN builds b ON b.id = g.build_id
       WHERE g.published_revision_id IS NOT NULL AND b.vehicle LIKE ?
       LIMIT ${MAX_VEHICLE_GUIDES}`,
      [likePattern(vehicle)],
    );
  }

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

  private async judge(query: ParsedQuery, guides: GuideRow[], interfaceIdsByGuide: Map<string, Set<string>>): Promise<JudgedGuide[]> {
    const vehicleWords = query.vehicle?.toLowerCase();
    const kept = guides.filter((guide) => !vehicleWords || guide.vehicle.toLowerCase().includes(vehicleWords));
    const interfaceIds = [...new Set(kept.flatMap((guide) => [...(interfaceIdsByGuide.get(guide.guideId) ?? [])]))];
    const manager = this.dataSource.manager;
    const interfaces = interfaceIds.length ? await manager.findBy(AssemblyInterface, { id: In(interfaceIds) }) : [];
    const featureIds = interfaces.flatMap((item) => [item.featureAId, item.featureBId].filter((id): id is string => !!id));
    const features = featureIds.length ? await manager.findBy(PartFeature, { id: In(featureIds) }) : [];
    const parts = features.length ? await manager.findBy(Part, { id: In([...new Set(features.map((feature) => feature.partId))]) }) : [];
    const readings = featureIds.length ? await manager.findBy(Measurement, { featureId: In(featureIds) }) : [];
    const assemblyIds = [...new Set(kept.map((guide) => guide.assemblyId))];
    const checks = assemblyIds.length ? await manager.findBy(FitCheck, { assemblyId: In(assemblyIds) }) : [];
    const checkByInterface = new Map(checks.filter((check) => check.interfaceId).map((check) => [check.interfaceId!, check]));
    const featureById = new Map(features.map((feature) => [feature.id, feature]));
    const partById = new Map(parts.map((part) => [part.id, part]));
    const label = (feature: PartFeature) => `${partById.get(feature.partId)?.partNumber ?? ''} ${feature.name}`.trim();

    const judged: JudgedGuide[] = [];
    for (const guide of kept) {
      const hits: Hit[] = [];
      const mine = interfaces.filter((item) => item.assemblyId === guide.assemblyId && interfaceIdsByGuide.get(guide.guideId)?.has(item.id));
      const best = (criterion: Criterion, judgements: { judgement: FinderJudgement; interfaceId: string }[]) => {
        let chosen: Hit | null = null;
        for (const { judgement, interfaceId } of judgements) {
          const check = checkByInterface.get(interfaceId) ?? null;
          if (judgement.verdict === 'no_match' || check?.state === 'retired') continue;
          const hit: Hit = { ...judgement, criterion, check, interfaceId };
          if (!chosen || verdictRank(hit.verdict) < verdictRank(chosen.verdict) || (hit.verdict === chosen.verdict && stateRankOf(hit) < stateRankOf(chosen))) {
            chosen = hit;
          }
        }
        return chosen;
      };
      const featuresOf = (item: AssemblyInterface) => [item.featureAId, item.featureBId].map((id) => (id ? featureById.get(id) : undefined)).filter((f): f is PartFeature => !!f);
      const criteria: (Hit | null)[] = [];
      if (query.spline) {
        const spline = query.spline;
        criteria.push(
          best(
            'spline',
            mine.filter((item) => item.kind === 'spline').flatMap((item) =>
              featuresOf(item)
                .filter((feature) => feature.kind === 'spline')
                .map((feature) => ({ interfaceId: item.id, judgement: judgeSpline(spline, recordedSpline(label(feature), feature.spec as SplineSpec)) })),
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
              featuresOf(item)
                .filter((feature) => feature.kind === 'diameter')
                .map((feature) => {
                  const spec = feature.spec as DiameterSpec;
                  const readingsNm = readings.filter((reading) => reading.featureId === feature.id && reading.quantity === 'diameter').map((reading) => reading.valueNm);
                  return {
                    interfaceId: item.id,
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
              const detail = checkByInterface.get(item.id)?.detail ?? null;
              const hole = featuresOf(item).find((feature) => (feature.spec as DiameterSpec).role === 'hole');
              if (!detail || !hole || typeof detail.clearanceMinNm !== 'number' || typeof detail.clearanceMaxNm !== 'number') return [];
              const measured = isMeasured(detail.hole) && isMeasured(detail.shaft);
              return [
                {
                  interfaceId: item.id,
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
              featuresOf(item)
                .filter((feature) => feature.kind === 'length')
                .map((feature) => {
                  const spec = feature.spec as LengthSpec;
                  return { interfaceId: item.id, judgement: judgeLength(length, { name: label(feature), lengthNm: spec.lengthNm, compressedNm: spec.compressedNm, extendedNm: spec.extendedNm }) };
                }),
            ),
          ),
        );
      }
      if (criteria.length === 0) {
        hits.push(this.partHit(query, guide, checks));
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
  private partHit(query: ParsedQuery, guide: GuideRow, checks: FitCheck[]): Hit {
    const own = checks.filter((check) => check.assemblyId === guide.assemblyId && check.state !== 'retired');
    own.sort((a, b) => finderStateRank(a.state) - finderStateRank(b.state));
    const reasons: string[] = [];
    if (query.partNumberKey || query.maker) reasons.push(`in this assembly: ${query.understood.filter((line) => line.startsWith('part') || line.startsWith('maker')).join(', ')}`);
    if (query.vehicle) reasons.push(`vehicle: ${guide.vehicle}`);
    return { criterion: 'part', verdict: 'match', reasons, check: own[0] ?? null, interfaceId: own[0]?.interfaceId ?? null };
  }

  /** The shown details of the page only: readings with units, evidence moments, names and fit reports. */
  private async describe(entries: JudgedGuide[]): Promise<FitFinderResultDto[]> {
    if (entries.length === 0) return [];
    const manager = this.dataSource.manager;
    const hits = entries.flatMap((entry) => entry.hits);
    const checkIds = hits.map((hit) => hit.check?.id).filter((id): id is string => !!id);
    const interfaceIds = hits.map((hit) => hit.interfaceId).filter((id): id is string => !!id);
    const interfaces = interfaceIds.length ? await manager.findBy(AssemblyInterface, { id: In(interfaceIds) }) : [];
    const featureIds = interfaces.flatMap((item) => [item.featureAId, item.featureBId].filter((id): id is string => !!id));
    const evidence = checkIds.length ? await manager.findBy(FitCheckEvidence, { fitCheckId: In(checkIds) }) : [];
    const evidenceMeasurementIds = evidence.map((item) => item.measurementId).filter((id): id is string => !!id);
    const measurementWhere = [
      ...(featureIds.length ? [{ featureId: In(featureIds) }] : []),
      ...(interfaceIds.length ? [{ interfaceId: In(interfaceIds) }] : []),
      ...(evidenceMeasurementIds.length ? [{ id: In(evidenceMeasurementIds) }] : []),
    ];
    const measurements = measurementWhere.length ? await manager.find(Measurement, { where: measurementWhere, order: { takenAt: 'ASC' } }) : [];
    const markIds = evidence.map((item) => item.markId).filter((id): id is string => !!id);
    const markWhere = [...(markIds.length ? [{ id: In(markIds) }] : []), ...(checkIds.length ? [{ fitCheckId: In(checkIds) }] : [])];
    const marks = markWhere.length ? await manager.find(Mark, { where: markWhere }) : [];
    const features = featureIds.length ? await manager.findBy(PartFeature, { id: In(featureIds) }) : [];
    const measuredFeatureIds = measurements.map((item) => item.featureId).filter((id): id is string => !!id);
    const allFeatures = [...features, ...(measuredFeatureIds.some((id) => !features.find((f) => f.id === id)) ? await manager.findBy(PartFeature, { id: In(measuredFeatureIds) }) : [])];
    const parts = allFeatures.length ? await manager.findBy(Part, { id: In([...new Set(allFeatures.map((feature) => feature.partId))]) }) : [];
    const names = await this.users.displayNames(
      entries.filter((entry) => Number(entry.guide.showMemberNames) === 1).flatMap((entry) => entry.hits.map((hit) => hit.check?.confirmedBy).filter((id): id is string => !!id)),
    );
    const reports = await this.dataSource.query<{ guideId: string; outcome: string; count: string }[]>(
      `SELECT guide_id AS guideId, outcome, COUNT(*) AS count FROM fit_reports
       WHERE guide_id IN (?) AND status <> 'declined' GROUP BY guide_id, outcome`,
      [entries.map((entry) => entry.guide.guideId)],
    );
    const featureLabel = (featureId: string | null) => {
      const feature = allFeatures.find((item) => item.id === featureId);
      if (!feature) return 'across the interface';
      return `${parts.find((part) => part.id === feature.partId)?.partNumber ?? ''} ${feature.name}`.trim();
    };

    return entries.map(({ guide, hits, verdict }) => {
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
      return {
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
    });
  }
}

interface JudgedGuide {
  guide: GuideRow;
  hits: Hit[];
  verdict: FinderVerdict;
}

/** At most this many guides are read for a vehicle-only query (it has no key to start from). */
const MAX_VEHICLE_GUIDES = 1000;

function verdictRank(verdict: FinderVerdict): number {
  return verdict === 'match' ? 0 : verdict === 'near_miss' ? 1 : 2;
}

function stateRankOf(hit: Hit): number {
  return finderStateRank(hit.check?.state ?? 'open');
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
