import { INestApplicationContext } from '@nestjs/common';
import { DataSource } from 'typeorm';
import { AssembliesService } from '../../assemblies/assemblies.service';
import { hashPassword } from '../../auth/password-hasher';
import { BuildsService } from '../../builds/builds.service';
import { newId } from '../../common/database/columns';
import { FitChecksService } from '../../fit-checks/fit-checks.service';
import { GuidesService } from '../../guides/guides.service';
import { MarksService } from '../../marks/marks.service';
import { FootageService } from '../../footage/footage.service';
import { PartsService } from '../../parts/parts.service';
import { User } from '../../users/entities/user.entity';
import { WorkshopMember } from '../../workshops/entities/workshop-member.entity';
import { Workshop } from '../../workshops/entities/workshop.entity';
import { DEMO_PASSWORD } from './demo-accounts';
import { DEMO_BUILD_TITLE } from './demo-fit-data';

/**
 * The demo's second workshop (invented, like everything in the demo): a shop converting a utility van,
 * whose coupler has the same 21 teeth as Harrow Lane's but a finer 24/48 pitch. A fit finder query for
 * "21 teeth, 16/32" then shows Harrow Lane's confirmed match and this guide as a near miss
 * ("same teeth, other pitch"). Its members' names stay off public pages; Harrow Lane shows them.
 */
export const SECOND_WORKSHOP = {
  slug: 'quarry-hill-fabrication',
  name: 'Quarry Hill Fabrication',
  description: 'A one-person fabrication shop putting electric drive into a 1970s utility van. (An invented demo workshop.)',
};
export const SECOND_WORKSHOP_OWNER = { email: 'tamsin@quarry-hill.example', displayName: 'Tamsin Reyes', role: 'owner of Quarry Hill Fabrication' };
export const SECOND_BUILD_TITLE = 'Van motor coupler';
export const SECOND_GUIDE_TITLE = 'A 24/48-pitch coupler for the van gearbox';

/** Idempotent: the guide of that title on that build means the second workshop is loaded. */
export async function loadDemoSecondWorkshop(app: INestApplicationContext): Promise<string> {
  const dataSource = app.get(DataSource);
  const { workshopId, ownerId } = await ensureOwnerAndWorkshop(dataSource);
  const builds = app.get(BuildsService);
  const guides = app.get(GuidesService);
  let build = (await builds.list(workshopId)).find((candidate) => candidate.title === SECOND_BUILD_TITLE);
  if (build && (await guides.list(workshopId, build.id)).some((guide) => guide.title === SECOND_GUIDE_TITLE)) return 'second demo workshop already loaded';

  build ??= await builds.create(workshopId, ownerId, {
    title: SECOND_BUILD_TITLE,
    vehicle: 'Utility van, 1970s, electric conversion',
    goal: 'Drive the van’s four-speed gearbox from a salvaged traction motor through a bought-in coupler.',
    status: 'in_progress',
  });
  const parts = app.get(PartsService);
  const coupler = await parts.create(workshopId, {
    partNumber: 'QH-2148',
    maker: 'Quarry Hill Fabrication',
    title: 'Motor coupler, 21-tooth fine-pitch spline',
    category: 'coupler',
    source: 'new',
    notes: 'Broached 21-tooth 24/48 spline; motor end bored to suit.',
    features: [
      { name: 'gearbox spline', kind: 'spline', teeth: 21, gender: 'internal', diametralPitch: 24, stubPitch: 48, pressureAngle: 30, splineFit: 'side', splineClass: 5 },
      { name: 'motor bore', kind: 'diameter', role: 'hole', nominal: '0.875', toleranceClass: 'H7', unit: 'in' },
    ],
  });
  const input = await parts.create(workshopId, {
    partNumber: 'VG-421-IN',
    maker: 'Vantry Gear',
    title: 'Four-speed gearbox input shaft',
    category: 'shaft',
    source: 'used',
    notes: 'From a breaker’s yard gearbox; splines clean, no step wear.',
    features: [{ name: 'input spline', kind: 'spline', teeth: 21, gender: 'external', diametralPitch: 24, stubPitch: 48, pressureAngle: 30, splineFit: 'side', splineClass: 5 }],
  });
  const assemblies = app.get(AssembliesService);
  const stack = await assemblies.create(workshopId, build.id, { name: 'Fine-pitch coupler on the van gearbox', notes: 'Coupler and the used gearbox input shaft.' });
  await assemblies.placePart(workshopId, stack.id, coupler.id, { position: 'coupler', sortOrder: 0 });
  await assemblies.placePart(workshopId, stack.id, input.id, { position: 'gearbox input', sortOrder: 1 });
  await assemblies.addInterface(workshopId, stack.id, ownerId, {
    kind: 'spline',
    name: 'coupler to van gearbox input',
    featureAId: coupler.features!.find((feature) => feature.name === 'gearbox spline')!.id,
    featureBId: input.features!.find((feature) => feature.name === 'input spline')!.id,
  });

  const guide = await guides.create(workshopId, build.id, ownerId, {
    title: SECOND_GUIDE_TITLE,
    summary:
      '<p>The van’s gearbox has a 21-tooth input spline like many compact pickups, but at the finer 24/48 pitch: ' +
      'a 16/32 coupler will not slide on. This guide shows how the pitch was told apart and the coupler chosen.</p>',
    footageId: null,
    assemblyId: stack.id,
    safetyTopics: ['rotating_parts'],
    tools: ['Pin gauges', 'Vernier caliper', '0–25 mm outside micrometer'],
    consumables: ['Spline grease'],
  });
  const steps = [
    {
      title: 'Count the teeth, then measure over pins',
      body: '<p>Both parts have 21 teeth. Count twice, then measure the major diameter: 24/48 pitch gives about 0.92 in, 16/32 about 1.38 in (ANSI B92.1 basic major diameter (N + 1)/P).</p>',
    },
    {
      title: 'Slide the coupler on by hand',
      body: '<p>Grease the spline and slide the coupler on by hand, never with a hammer. It should run the full length without a tight spot.</p>',
      caution: { level: 'WARNING' as const, text: 'Keep hands clear of the coupler whenever the motor can be powered.' },
    },
  ];
  for (const step of steps) await guides.addStep(workshopId, guide.id, step);
  const revision = await guides.publish(workshopId, guide.id, ownerId, 'First publication.');
  return `second demo workshop "${SECOND_WORKSHOP.name}" published "${SECOND_GUIDE_TITLE}" as revision ${revision.number}`;
}

/**
 * Harrow Lane's side of the finder demo: the workshop shows its members' names publicly, and its
 * 21-tooth spline check (passed on the bench) has the moment the narration counts the teeth as
 * evidence, so the finder's link opens the guide there. Idempotent; after the demo guide and marks.
 */
export async function loadDemoFinderEvidence(app: INestApplicationContext, { workshopId, creatorId }: { workshopId: string; creatorId: string }): Promise<string> {
  await app.get(DataSource).getRepository(Workshop).update({ id: workshopId }, { showMemberNames: true });
  const build = (await app.get(BuildsService).list(workshopId)).find((candidate) => candidate.title === DEMO_BUILD_TITLE);
  const assembly = build && (await app.get(AssembliesService).list(workshopId, build.id)).find((candidate) => candidate.name === '21-tooth coupler stack');
  if (!build || !assembly) return 'finder evidence skipped: the demo build is missing';
  const fitChecks = app.get(FitChecksService);
  const { items } = await fitChecks.checklist(workshopId, assembly.id);
  const splineItem = items.find(({ check }) => check.kind === 'spline_match');
  if (!splineItem) return 'finder evidence skipped: no spline check';
  const spline = splineItem.check;
  const footage = (await app.get(FootageService).list(workshopId, build.id))[0];
  const marks = footage ? await app.get(MarksService).list(workshopId, footage.id) : [];
  const counting = marks.find((mark) => mark.label.startsWith('Counting the coupler'));
  if (!counting) return 'finder evidence skipped: the counting mark is missing';
  if (splineItem.evidence.some((item) => item.markId === counting.id)) return 'finder evidence already loaded';
  await fitChecks.addEvidence(workshopId, spline.id, creatorId, { kind: 'mark', markId: counting.id, note: 'Both sides counted on camera: 21 teeth.' });
  return 'the 21-tooth spline check has the counting moment as evidence';
}

async function ensureOwnerAndWorkshop(dataSource: DataSource): Promise<{ workshopId: string; ownerId: string }> {
  return dataSource.transaction(async (manager) => {
    const users = manager.getRepository(User);
    let owner = await users.findOneBy({ email: SECOND_WORKSHOP_OWNER.email });
    if (!owner) {
      owner = users.create({
        id: newId(),
        email: SECOND_WORKSHOP_OWNER.email,
        passwordHash: await hashPassword(DEMO_PASSWORD),
        displayName: SECOND_WORKSHOP_OWNER.displayName,
        preferredUnits: 'inch',
        emailVerifiedAt: new Date(),
        isAdmin: false,
        disabledAt: null,
      });
      await users.insert(owner);
    }
    const workshops = manager.getRepository(Workshop);
    let workshop = await workshops.findOneBy({ slug: SECOND_WORKSHOP.slug });
    if (!workshop) {
      workshop = workshops.create({ id: newId(), ...SECOND_WORKSHOP, logoKey: null, disabledAt: null, showMemberNames: false });
      await workshops.insert(workshop);
    }
    const members = manager.getRepository(WorkshopMember);
    if (!(await members.existsBy({ workshopId: workshop.id, userId: owner.id }))) {
      await members.insert(members.create({ id: newId(), workshopId: workshop.id, userId: owner.id, role: 'owner' }));
    }
    return { workshopId: workshop.id, ownerId: owner.id };
  });
}
