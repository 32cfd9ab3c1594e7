import { INestApplicationContext } from '@nestjs/common';
import { AssembliesService } from '../../assemblies/assemblies.service';
import { BuildsService } from '../../builds/builds.service';
import { FitChecksService } from '../../fit-checks/fit-checks.service';
import { FitReportsService } from '../../fit-reports/fit-reports.service';
import { FollowsService } from '../../follows/follows.service';
import { FootageService } from '../../footage/footage.service';
import { GuidesService } from '../../guides/guides.service';
import type { CreateStepDto } from '../../guides/dto/guide.dto';
import { MarksService } from '../../marks/marks.service';
import { TranscriptsService } from '../../transcripts/transcripts.service';
import { DEMO_WORKSHOP } from './demo-accounts';
import { DEMO_BUILD_TITLE } from './demo-fit-data';
import { DEMO_FOOTAGE_TITLE } from './demo-footage';

/**
 * The demo build's published guide: the steps of the walkthrough, each anchored where its narration
 * starts (demo-footage.ts), the 21-tooth stack's checklist and parts, and a step mark or two. All of
 * it is invented for the demo scenario (DESIGN.md).
 */
export const DEMO_GUIDE_TITLE = 'Fitting the 21-tooth coupler stack';
const DEMO_ASSEMBLY_NAME = '21-tooth coupler stack';
/** High-voltage isolation and readings to the tenth: not a first job. Three hours, the steps' 2 h 30 min plus set-up and clean-up. */
const DEMO_EFFORT = { skillLevel: 'seasoned_fitter', estimatedMinutes: 180 } as const;

interface DemoStep extends Omit<CreateStepDto, 'startMs' | 'endMs' | 'footageId'> {
  /** A phrase of the cue where the step starts. */
  cue: string;
  /** A step mark at that cue, with this label. */
  mark?: string;
}

const DEMO_STEPS: DemoStep[] = [
  {
    title: 'Make the truck safe to work under',
    estimatedMinutes: 30,
    cue: 'Welcome back',
    body: '<p>Raise the pickup at the lifting points and hold it on axle stands. Isolate the traction battery and prove it dead before reaching near the motor.</p>',
    caution: { level: 'DANGER', text: 'The traction battery stays live until it is isolated and proven dead with a meter rated for it.' },
  },
  {
    title: 'Count the splines on both sides',
    estimatedMinutes: 10,
    cue: 'First, the spline',
    body: '<p>Count the coupler’s teeth and the gearbox input shaft’s. Both must be <strong>21 teeth at 16/32 pitch</strong>; the 27-tooth catalogue coupler does not fit this shaft.</p>',
    mark: 'Counting the coupler’s 21 teeth',
  },
  {
    title: 'Seat the coupler and check end float',
    estimatedMinutes: 20,
    cue: 'With the coupler seated',
    body: '<p>Slide the coupler onto the motor shaft by hand, never with a hammer. With it seated, a feeler gauge at the motor face should show about 0.015 in of end float.</p>',
    mark: 'Feeler gauge at the motor face',
  },
  {
    title: 'Check the pilot bearing bore against the pilot nose',
    estimatedMinutes: 25,
    cue: 'Next, the pilot bearing bore',
    body: '<p>Measure the bore with a bore gauge and the pilot nose with a micrometer. Expect a sliding fit: H7/g6 at 15 mm gives 6 to 35 µm of clearance (ISO 286-2: H7 +18/0, g6 −6/−17), about 0.2 to 1.4 thou.</p>',
  },
  {
    title: 'Check the driveshaft sits inside its window',
    estimatedMinutes: 35,
    cue: 'Last, the driveshaft window',
    body: '<p>Compare the slip yoke’s travel with the installed length at bump and at droop; keep at least 5 mm of plunge margin at each end.</p>',
  },
  {
    title: 'Bolt up and turn it by hand',
    estimatedMinutes: 30,
    cue: 'Bolted up on the truck',
    body: '<p>Torque the adapter plate bolts to the figure in the motor maker’s instructions, then turn the input by hand: it should turn freely with no tight spot.</p>',
    caution: { level: 'WARNING', text: 'Keep hands clear of the coupler whenever the motor can be powered.' },
  },
];

interface Ids {
  workshopId: string;
  creatorId: string;
}

/** Idempotent: a guide of that title on the demo build means the demo guide is already there. */
export async function loadDemoGuide(app: INestApplicationContext, { workshopId, creatorId }: Ids): Promise<string> {
  const guides = app.get(GuidesService);
  const build = (await app.get(BuildsService).list(workshopId)).find((candidate) => candidate.title === DEMO_BUILD_TITLE);
  const footage = build && (await app.get(FootageService).list(workshopId, build.id)).find((item) => item.title === DEMO_FOOTAGE_TITLE);
  if (!build || !footage?.transcript) return 'demo guide skipped: the demo footage or its transcript is missing';
  const existing = (await guides.list(workshopId, build.id)).find((guide) => guide.title === DEMO_GUIDE_TITLE);
  if (existing) {
    const effort = existing.skillLevel ? null : await addDemoEffort(guides, workshopId, existing.id, creatorId);
    const reworded = await addDemoSecondRevision(guides, workshopId, existing.id, creatorId);
    return [effort, reworded].filter(Boolean).join('; ') || 'demo guide already loaded';
  }

  const assembly = (await app.get(AssembliesService).list(workshopId, build.id)).find((candidate) => candidate.name === DEMO_ASSEMBLY_NAME);
  const { cues } = await app.get(TranscriptsService).read(workshopId, footage.id);
  const guide = await guides.create(workshopId, build.id, creatorId, {
    title: DEMO_GUIDE_TITLE,
    summary:
      '<p>How Harrow Lane Garage couples the electric motor to the pickup’s original gearbox with the in-house 21-tooth coupler: ' +
      'what to check on the bench, what to measure, and how the fit was confirmed on the truck.</p>',
    footageId: footage.id,
    assemblyId: assembly?.id ?? null,
    safetyTopics: ['lifting', 'high_voltage', 'rotating_parts'],
    tools: ['Axle stands (pair)', 'Insulated gloves and a CAT III meter', 'Feeler gauges', 'Bore gauge, 10–18 mm', '0–25 mm outside micrometer', 'Torque wrench'],
    consumables: ['Spline grease', 'Medium-strength thread locker'],
    ...DEMO_EFFORT,
  });

  const marks = app.get(MarksService);
  for (const { cue: phrase, mark, ...step } of DEMO_STEPS) {
    const cue = cues.find((candidate) => candidate.text.includes(phrase));
    if (!cue) throw new Error(`the demo transcript has no cue saying "${phrase}"`);
    const created = await guides.addStep(workshopId, guide.id, { ...step, startMs: cue.startMs, endMs: cue.endMs });
    if (mark) await marks.create(workshopId, footage.id, creatorId, { kind: 'step', label: mark, startMs: cue.startMs + 500, guideStepId: created.id });
  }
  const revision = await guides.publish(workshopId, guide.id, creatorId, 'First publication of the bench and truck checks.');
  const reworded = await addDemoSecondRevision(guides, workshopId, guide.id, creatorId);
  return `demo guide "${DEMO_GUIDE_TITLE}" published as revision ${revision.number} with ${DEMO_STEPS.length} steps; ${reworded}`;
}

const SECOND_REVISION_NOTE = 'Clearer end-float step: where to hold the feeler gauge and what reading to expect.';
const END_FLOAT_TITLE = 'Seat the coupler and check end float';

/**
 * A second published revision with a real difference, so a newcomer can open revision 1 and compare it with
 * the current one: the end-float step gets a new title and a clearer body. Nothing when already published.
 */
async function addDemoSecondRevision(guides: GuidesService, workshopId: string, guideId: string, creatorId: string): Promise<string | null> {
  if ((await guides.listRevisions(workshopId, guideId)).some((revision) => revision.note === SECOND_REVISION_NOTE)) return null;
  const step = (await guides.describe(workshopId, guideId)).steps.find((candidate) => candidate.title === END_FLOAT_TITLE);
  if (!step) return 'demo guide second revision skipped: the end-float step is missing';
  await guides.updateStep(workshopId, guideId, step.id, {
    title: 'Seat the coupler and read its end float',
    body:
      '<p>Slide the coupler onto the motor shaft by hand, never with a hammer. With it seated, hold a feeler gauge square to the motor face: ' +
      'expect 0.012 to 0.018 in of end float, and note the reading on the job sheet.</p>',
  });
  const revision = await guides.publish(workshopId, guideId, creatorId, SECOND_REVISION_NOTE);
  return `demo guide revision ${revision.number}: the end-float step reworded`;
}

/** A demo guide loaded before guides had a skill level and times gets them, in a new revision. */
async function addDemoEffort(guides: GuidesService, workshopId: string, guideId: string, creatorId: string): Promise<string> {
  await guides.update(workshopId, guideId, DEMO_EFFORT);
  const { steps } = await guides.describe(workshopId, guideId);
  for (const step of steps) {
    const estimatedMinutes = DEMO_STEPS.find((candidate) => candidate.title === step.title)?.estimatedMinutes;
    if (estimatedMinutes) await guides.updateStep(workshopId, guideId, step.id, { estimatedMinutes });
  }
  const revision = await guides.publish(workshopId, guideId, creatorId, 'Added the skill level and time estimates.');
  return `demo guide given a skill level and times in revision ${revision.number}`;
}

/**
 * The demo follower follows the guide's build and has sent a fit report from the guide (invented: a
 * 21-tooth coupler on a sister truck), which the workshop tied to its retention check. Idempotent.
 */
export async function loadDemoFollower(app: INestApplicationContext, { workshopId, followerId }: { workshopId: string; followerId: string }): Promise<string> {
  const build = (await app.get(BuildsService).list(workshopId)).find((candidate) => candidate.title === DEMO_BUILD_TITLE);
  if (!build) return 'demo follower skipped: the demo build is missing';
  const { created } = await app.get(FollowsService).follow(followerId, 'build', build.id);
  const reports = app.get(FitReportsService);
  const guide = (await app.get(GuidesService).list(workshopId, build.id)).find((candidate) => candidate.title === DEMO_GUIDE_TITLE);
  if (guide && (await reports.mine(followerId)).length === 0) {
    const report = await reports.create(followerId, DEMO_WORKSHOP.slug, guide.slug, {
      outcome: 'fit',
      parts: 'HL-2107 coupler on the five-speed input shaft (OM-G5-IN), with the adapter plate from the guide',
      vehicle: 'Compact pickup, same generation, long bed',
      notes: 'Slid on by hand and turned freely. I used a new set screw; is staking it enough?',
    });
    const retention = await findRetentionCheck(app, workshopId, build.id);
    if (retention) await reports.update(workshopId, report.id, { fitCheckId: retention, creatorNote: 'Thanks! We are checking retention on our truck next.' });
    // A second, newer claim waits for review.
    await reports.create(followerId, DEMO_WORKSHOP.slug, guide.slug, {
      outcome: 'no_fit',
      parts: 'BD-2741 catalogue coupler on the five-speed input shaft',
      vehicle: 'Compact pickup, same generation, long bed',
      notes: 'Would not start onto the shaft at all. Counted 27 teeth on the coupler.',
    });
  }
  return created ? `the demo follower follows "${DEMO_BUILD_TITLE}" and has sent a fit report` : 'demo follower already loaded';
}

async function findRetentionCheck(app: INestApplicationContext, workshopId: string, buildId: string): Promise<string | null> {
  const assembly = (await app.get(AssembliesService).list(workshopId, buildId)).find((candidate) => candidate.name === DEMO_ASSEMBLY_NAME);
  if (!assembly) return null;
  const { items } = await app.get(FitChecksService).checklist(workshopId, assembly.id);
  return items.find(({ check }) => check.title.startsWith('Retention'))?.check.id ?? null;
}
