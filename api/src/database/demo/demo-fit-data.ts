import { INestApplicationContext, Logger } from '@nestjs/common';
import { AssembliesService } from '../../assemblies/assemblies.service';
import { BuildsService } from '../../builds/builds.service';
import { FitChecksService } from '../../fit-checks/fit-checks.service';
import { MeasurementsService } from '../../measurements/measurements.service';
import { CreatePartDto } from '../../parts/dto/part.dto';
import { PartsService } from '../../parts/parts.service';

/**
 * The demo scenario's fit data (DESIGN.md, "Demo scenario"): an invented workshop converting an
 * invented 1980s compact pickup to electric drive. Every maker, part number and reading is made up.
 * Loaded through the services, so the checklist is derived exactly as it is for a real creator.
 */
export const DEMO_BUILD_TITLE = 'Motor-to-gearbox coupler';

const DEMO_PARTS: CreatePartDto[] = [
  {
    partNumber: 'HL-2107',
    maker: 'Harrow Lane Garage',
    title: 'Motor coupler, 21-tooth gearbox spline',
    category: 'coupler',
    source: 'new',
    notes: 'Machined in house from 4140 bar; keyed motor bore, broached 21-tooth spline.',
    features: [
      { name: 'gearbox spline', kind: 'spline', teeth: 21, gender: 'internal', diametralPitch: 16, stubPitch: 32, pressureAngle: 30, splineFit: 'side', splineClass: 5 },
      { name: 'motor bore', kind: 'diameter', role: 'hole', nominal: '24', toleranceClass: 'H7', unit: 'mm' },
    ],
  },
  {
    partNumber: 'BD-2741',
    maker: 'Brackwater Driveline',
    title: 'Motor coupler, 27-tooth spline (catalogue part)',
    category: 'coupler',
    source: 'new',
    notes: 'Sent in by a follower as a possible off-the-shelf coupler.',
    features: [{ name: 'gearbox spline', kind: 'spline', teeth: 27, gender: 'internal', diametralPitch: 16, stubPitch: 32, pressureAngle: 30, splineFit: 'side', splineClass: 5 }],
  },
  {
    partNumber: 'OM-G5-IN',
    maker: 'Ostler Motor Works',
    title: 'Five-speed gearbox input shaft',
    category: 'shaft',
    source: 'remanufactured',
    notes: 'Remanufactured unit; pilot nose diameters vary from box to box, so measure each one.',
    features: [
      { name: 'input spline', kind: 'spline', teeth: 21, gender: 'external', diametralPitch: 16, stubPitch: 32, pressureAngle: 30, splineFit: 'side', splineClass: 5 },
      { name: 'pilot nose', kind: 'diameter', role: 'shaft', nominal: '15', toleranceClass: 'g6', unit: 'mm' },
    ],
  },
  {
    partNumber: 'KB-6202-P',
    maker: 'Kettleby Bearings',
    title: 'Pilot bearing, sealed',
    category: 'bearing',
    source: 'new',
    notes: '',
    features: [{ name: 'bearing bore', kind: 'diameter', role: 'hole', nominal: '15', toleranceClass: 'H7', unit: 'mm' }],
  },
  {
    partNumber: 'OM-TR-090',
    maker: 'Ostler Motor Works',
    title: 'Traction motor, 90 kW',
    category: 'other',
    source: 'used',
    notes: 'From a salvaged van; output shaft keyed.',
    features: [
      { name: 'output shaft', kind: 'diameter', role: 'shaft', nominal: '24', toleranceClass: 'k6', unit: 'mm' },
      { name: 'mounting pattern', kind: 'free', value: '6 × M10 on 150 mm PCD' },
    ],
  },
  {
    partNumber: 'HL-AP3',
    maker: 'Harrow Lane Garage',
    title: 'Adapter plate, motor to bell housing',
    category: 'plate',
    source: 'new',
    notes: '12 mm 6061-T6 plate, register bore bored on the mill.',
    features: [{ name: 'register bore', kind: 'diameter', role: 'hole', nominal: '110', toleranceClass: 'H7', unit: 'mm' }],
  },
  {
    partNumber: 'BD-DS540',
    maker: 'Brackwater Driveline',
    title: 'Rear driveshaft with slip yoke',
    category: 'shaft',
    source: 'new',
    notes: '',
    features: [{ name: 'length', kind: 'length', length: '540', compressed: '520', extended: '565', unit: 'mm' }],
  },
];

interface Ids {
  workshopId: string;
  creatorId: string;
}

export async function loadDemoFitData(app: INestApplicationContext, { workshopId, creatorId }: Ids): Promise<void> {
  const logger = new Logger('Demo');
  const builds = app.get(BuildsService);
  if ((await builds.list(workshopId)).some((build) => build.title === DEMO_BUILD_TITLE)) {
    logger.log('demo fit data already loaded');
    return;
  }
  const parts = app.get(PartsService);
  const assemblies = app.get(AssembliesService);
  const measurements = app.get(MeasurementsService);
  const fitChecks = app.get(FitChecksService);

  const build = await builds.create(workshopId, creatorId, {
    title: DEMO_BUILD_TITLE,
    vehicle: 'Compact pickup, 1980s, electric conversion',
    goal: 'Couple the traction motor to the original five-speed gearbox without re-machining the input shaft, and keep the rear driveshaft inside its travel.',
    status: 'in_progress',
  });
  const created = new Map<string, Awaited<ReturnType<PartsService['create']>>>();
  for (const part of DEMO_PARTS) created.set(part.partNumber, await parts.create(workshopId, part));
  const feature = (partNumber: string, name: string) => created.get(partNumber)!.features!.find((item) => item.name === name)!.id;

  // The 21-tooth stack: the combination this build is proving.
  const stack = await assemblies.create(workshopId, build.id, {
    name: '21-tooth coupler stack',
    notes: 'Motor, in-house coupler, pilot bearing and the original gearbox input shaft.',
  });
  const placements: [string, string][] = [
    ['OM-TR-090', 'motor'],
    ['HL-2107', 'coupler'],
    ['KB-6202-P', 'pilot bearing'],
    ['OM-G5-IN', 'gearbox input'],
    ['BD-DS540', 'rear driveshaft'],
  ];
  for (const [index, [partNumber, position]] of placements.entries()) {
    await assemblies.placePart(workshopId, stack.id, created.get(partNumber)!.id, { position, sortOrder: index });
  }
  await assemblies.addInterface(workshopId, stack.id, creatorId, {
    kind: 'spline',
    name: 'coupler to gearbox input',
    featureAId: feature('HL-2107', 'gearbox spline'),
    featureBId: feature('OM-G5-IN', 'input spline'),
  });
  await assemblies.addInterface(workshopId, stack.id, creatorId, {
    kind: 'bore_shaft',
    name: 'pilot bearing on input shaft nose',
    featureAId: feature('KB-6202-P', 'bearing bore'),
    featureBId: feature('OM-G5-IN', 'pilot nose'),
    margin: '0.005',
    unit: 'mm',
  });
  await assemblies.addInterface(workshopId, stack.id, creatorId, {
    kind: 'bore_shaft',
    name: 'coupler on motor shaft',
    featureAId: feature('HL-2107', 'motor bore'),
    featureBId: feature('OM-TR-090', 'output shaft'),
  });
  await assemblies.addInterface(workshopId, stack.id, creatorId, {
    kind: 'length_window',
    name: 'rear driveshaft, bump to droop',
    featureAId: feature('BD-DS540', 'length'),
    installedMin: '530',
    installedMax: '555',
    margin: '5',
    unit: 'mm',
  });

  // Readings, in the units and instruments a shop would use.
  const micrometer = { instrumentKind: 'outside_micrometer', resolution: '0.0001', unit: 'in', calibratedOn: '2026-09-14' } as const;
  const boreGauge = { instrumentKind: 'bore_gauge', resolution: '0.001', unit: 'mm', calibratedOn: '2026-08-02' } as const;
  await measurements.create(workshopId, creatorId, { featureId: feature('OM-G5-IN', 'pilot nose'), quantity: 'diameter', value: '0.5902', ...micrometer, temperatureC: 20.5 });
  await measurements.create(workshopId, creatorId, { featureId: feature('OM-G5-IN', 'pilot nose'), quantity: 'diameter', value: '0.5901', ...micrometer, temperatureC: 20.5 });
  await measurements.create(workshopId, creatorId, { featureId: feature('KB-6202-P', 'bearing bore'), quantity: 'diameter', value: '15.008', ...boreGauge });
  await measurements.create(workshopId, creatorId, { featureId: feature('HL-2107', 'motor bore'), quantity: 'diameter', value: '24.012', ...boreGauge });
  const motorShaft = await measurements.create(workshopId, creatorId, {
    featureId: feature('OM-TR-090', 'output shaft'),
    quantity: 'diameter',
    value: '0.9453',
    ...micrometer,
    note: 'Measured at the key end.',
  });

  // The test fit on the vehicle, confirmed with evidence.
  const testFit = await fitChecks.createManual(workshopId, stack.id, creatorId, {
    title: 'Test-fitted on the vehicle: motor, coupler and gearbox bolted up, turns by hand without bind',
  });
  await fitChecks.addEvidence(workshopId, testFit.id, creatorId, { kind: 'measurement', measurementId: motorShaft.id, note: 'Shaft reading taken during the test fit.' });
  await fitChecks.transition(workshopId, testFit.id, creatorId, { to: 'confirmed', reason: 'Bolted up on the truck; input turns freely by hand through a full revolution.' });
  await fitChecks.createManual(workshopId, stack.id, creatorId, { title: 'Retention: coupler set screw and key staked' });

  // The follower's 27-tooth suggestion, disproved by the spline count.
  const rejected = await assemblies.create(workshopId, build.id, {
    name: '27-tooth catalogue coupler',
    notes: 'Suggested in a fit report; kept to show why it does not fit.',
  });
  await assemblies.placePart(workshopId, rejected.id, created.get('BD-2741')!.id, { position: 'coupler', sortOrder: 0 });
  await assemblies.placePart(workshopId, rejected.id, created.get('OM-G5-IN')!.id, { position: 'gearbox input', sortOrder: 1 });
  await assemblies.addInterface(workshopId, rejected.id, creatorId, {
    kind: 'spline',
    name: 'catalogue coupler to gearbox input',
    featureAId: feature('BD-2741', 'gearbox spline'),
    featureBId: feature('OM-G5-IN', 'input spline'),
  });
  logger.log(`demo build "${DEMO_BUILD_TITLE}" loaded with ${DEMO_PARTS.length} parts and 2 assemblies`);
}
