import { INestApplicationContext } from '@nestjs/common';
import { setTimeout as sleep } from 'node:timers/promises';
import { AssembliesService } from '../../assemblies/assemblies.service';
import { BuildsService } from '../../builds/builds.service';
import type { FitCheck } from '../../fit-checks/entities/fit-check.entity';
import { FitChecksService } from '../../fit-checks/fit-checks.service';
import { FootageService } from '../../footage/footage.service';
import { MarkSuggestionsMiner } from '../../marks/mark-suggestions-miner.service';
import { MarksService } from '../../marks/marks.service';
import type { CreateMarkDto } from '../../marks/dto/mark.dto';
import type { Mark } from '../../marks/entities/mark.entity';
import { MeasurementsService } from '../../measurements/measurements.service';
import { PartsService } from '../../parts/parts.service';
import { TranscriptsService } from '../../transcripts/transcripts.service';
import { DEMO_BUILD_TITLE } from './demo-fit-data';
import { DEMO_FOOTAGE_TITLE } from './demo-footage';

/**
 * The demo walkthrough's marks, placed where its narration says each thing (demo-footage.ts): the
 * parts as they are named, the pilot-nose reading, the confirmed test fit, the safety caution and a
 * note. Times come from the transcript's cues, so they follow the clip however it was rendered.
 * Guide-step marks are left to the demo guide.
 */
interface DemoMark {
  /** A phrase of the cue the mark sits in (its narration). */
  cue: string;
  kind: 'part' | 'measurement' | 'check_evidence' | 'caution' | 'note';
  label: string;
  /** Where in the cue: its start, or half-way through (a second thing said in the same sentence). */
  at?: 'start' | 'middle';
  /** Spans the whole cue. */
  span?: boolean;
  partNumber?: string;
  /** The demo reading shown: its part, feature and value as taken. */
  reading?: { partNumber: string; feature: string; value: string };
  /** The start of the fit check's title. */
  fitCheck?: string;
}

export const DEMO_MARKS: DemoMark[] = [
  { cue: 'Welcome back', kind: 'note', label: 'Goal: prove the motor-to-gearbox coupler on the truck' },
  { cue: 'H L twenty-one oh seven', kind: 'part', label: 'In-house coupler, 21-tooth spline', partNumber: 'HL-2107' },
  { cue: 'The input shaft counts', kind: 'part', label: 'Gearbox input shaft: 21 teeth, matches', partNumber: 'OM-G5-IN' },
  {
    cue: 'The input shaft counts',
    kind: 'part',
    label: 'Catalogue coupler: 27 teeth, no fit',
    partNumber: 'BD-2741',
    at: 'middle',
  },
  {
    cue: 'pilot nose on the input shaft mikes',
    kind: 'measurement',
    label: 'Pilot nose miked at 0.5902 in',
    reading: { partNumber: 'OM-G5-IN', feature: 'pilot nose', value: '0.5902' },
  },
  { cue: 'Fit confirmed', kind: 'check_evidence', label: 'Bolted up, turns freely by hand', fitCheck: 'Test-fitted on the vehicle' },
  {
    cue: 'isolate the high voltage battery',
    kind: 'caution',
    label: 'DANGER: high-voltage battery isolated and proven dead; truck on stands before working under it',
    span: true,
  },
];

interface Ids {
  workshopId: string;
  creatorId: string;
}

/** Idempotent: adds the demo marks the footage lacks (by kind and label) and makes sure its suggestions were mined. */
export async function loadDemoMarks(app: INestApplicationContext, ids: Ids): Promise<string> {
  const { workshopId, creatorId } = ids;
  const builds = app.get(BuildsService);
  const footage = app.get(FootageService);
  const marks = app.get(MarksService);
  const build = (await builds.list(workshopId)).find((candidate) => candidate.title === DEMO_BUILD_TITLE);
  const demoFootage = build && (await footage.list(workshopId, build.id)).find((item) => item.title === DEMO_FOOTAGE_TITLE);
  if (!build || !demoFootage?.transcript) return 'demo marks skipped: the demo footage or its transcript is missing';
  const footageId = demoFootage.id;

  const pending = await mineSuggestions(app, workshopId, footageId);
  const { cues } = await app.get(TranscriptsService).read(workshopId, footageId);
  const links = await linkTargets(app, workshopId, build.id);
  const existing = await marks.list(workshopId, footageId);
  const has = (kind: string, label: string) => existing.some((mark) => mark.kind === kind && mark.label === label);

  const added: { demo: DemoMark; mark: Mark; cue: { startMs: number; endMs: number } }[] = [];
  for (const demo of DEMO_MARKS) {
    if (has(demo.kind, demo.label)) continue;
    const cue = cues.find((candidate) => candidate.text.includes(demo.cue));
    if (!cue) throw new Error(`the demo transcript has no cue saying "${demo.cue}"`);
    const startMs = demo.at === 'middle' ? Math.round((cue.startMs + cue.endMs) / 2) : cue.startMs;
    const input: CreateMarkDto = { kind: demo.kind, label: demo.label, startMs, endMs: demo.span ? cue.endMs : null };
    if (demo.partNumber) input.partId = links.part(demo.partNumber);
    if (demo.reading) input.measurementId = await links.reading(demo.reading);
    if (demo.fitCheck) input.fitCheckId = links.fitCheck(demo.fitCheck);
    added.push({ demo, mark: await marks.create(workshopId, footageId, creatorId, input), cue });
  }

  // A suggestion in the same sentence as a mark that already links its part or reading is settled, as a creator would.
  const settled = pending.filter((suggestion) =>
    added.some(
      ({ demo, mark, cue }) =>
        suggestion.startMs >= cue.startMs &&
        suggestion.startMs < cue.endMs &&
        ((suggestion.kind === 'part' && suggestion.partId !== null && suggestion.partId === mark.partId) ||
          (suggestion.kind === 'measurement' && demo.reading !== undefined && suggestion.value === demo.reading.value)),
    ),
  );
  for (const suggestion of settled) await marks.dismiss(workshopId, footageId, suggestion.id, creatorId);
  const waiting = pending.length - settled.length;
  return added.length
    ? `demo marks added: ${added.length}; ${waiting} suggestion(s) from the transcript wait to be reviewed`
    : 'demo marks already loaded';
}

/**
 * Attaching the transcript queued its mining on the marks queue, but this process may close before
 * the worker gets to it; mining here (once, when nothing was mined yet) makes the demo independent
 * of that. A job running at the same moment may collide with it, hence the retries.
 */
async function mineSuggestions(app: INestApplicationContext, workshopId: string, footageId: string) {
  const marks = app.get(MarksService);
  const all = async () =>
    (await Promise.all((['pending', 'accepted', 'dismissed'] as const).map((status) => marks.listSuggestions(workshopId, footageId, status)))).flat();
  if ((await all()).length === 0) {
    for (let attempt = 1; ; attempt += 1) {
      try {
        await app.get(MarkSuggestionsMiner).mine(workshopId, footageId);
        break;
      } catch (error) {
        if (attempt === 3) throw error;
        await sleep(500 * attempt);
      }
    }
  }
  return marks.listSuggestions(workshopId, footageId, 'pending');
}

/** Finds the records the demo marks point at, by the names the demo fit data gave them. */
async function linkTargets(app: INestApplicationContext, workshopId: string, buildId: string) {
  const parts = await app.get(PartsService).list(workshopId, {});
  const fitChecks = app.get(FitChecksService);
  const checks: FitCheck[] = [];
  for (const assembly of await app.get(AssembliesService).list(workshopId, buildId)) {
    checks.push(...(await fitChecks.checklist(workshopId, assembly.id)).items.map((item) => item.check));
  }
  const partOf = (partNumber: string) => {
    const part = parts.find((candidate) => candidate.partNumber === partNumber);
    if (!part) throw new Error(`the demo part ${partNumber} is missing`);
    return part;
  };
  return {
    part: (partNumber: string) => partOf(partNumber).id,
    fitCheck: (titleStart: string) => {
      const check = checks.find((candidate) => candidate.title.startsWith(titleStart));
      if (!check) throw new Error(`the demo fit check "${titleStart}…" is missing`);
      return check.id;
    },
    reading: async ({ partNumber, feature, value }: { partNumber: string; feature: string; value: string }) => {
      const featureId = partOf(partNumber).features?.find((candidate) => candidate.name === feature)?.id;
      const readings = featureId ? await app.get(MeasurementsService).list(workshopId, { featureId }) : [];
      const reading = readings.find((candidate) => candidate.valueText === value);
      if (!reading) throw new Error(`the demo reading ${value} of ${partNumber} ${feature} is missing`);
      return reading.id;
    },
  };
}
