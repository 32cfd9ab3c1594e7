import { useQuery } from '@tanstack/react-query';
import { LengthWindowDiagram } from '@/components/diagrams/length-window-diagram';
import { ToleranceZoneDiagram } from '@/components/diagrams/tolerance-zone-diagram';
import type { DeviationUnit } from '@/components/diagrams/tolerance-zone-geometry';
import { formatReadableLength } from '@/lib/units';
import { fitCheckQueries, type ChecklistAssembly, type ChecklistFeature, type FitCheck, type Reading, type ZoneUm } from '../api/queries';
import { readBoreShaft, readLengthWindow } from './check-detail';

export interface CheckDiagramProps {
  check: FitCheck;
  assembly: ChecklistAssembly;
  readings: Reading[];
  deviationUnit: DeviationUnit;
}

function findFeature(assembly: ChecklistAssembly, featureId: string | null): ChecklistFeature | null {
  for (const { part } of assembly.parts) {
    const feature = part.features.find((candidate) => candidate.id === featureId);
    if (feature) return feature;
  }
  return null;
}

/** The picture that goes with a derived check: tolerance zones for a bore and shaft, the window for a length. */
export function CheckDiagram({ check, assembly, readings, deviationUnit }: CheckDiagramProps) {
  const assemblyInterface = assembly.interfaces.find((candidate) => candidate.id === check.interfaceId);
  if (!assemblyInterface) return null;
  if (check.kind === 'length_window') {
    const detail = readLengthWindow(check);
    return detail ? <LengthWindowDiagram {...detail} unit={assemblyInterface.unit} title={check.title} /> : null;
  }
  if (check.kind === 'fit') {
    const first = findFeature(assembly, assemblyInterface.featureAId);
    const second = findFeature(assembly, assemblyInterface.featureBId);
    const [hole, shaft] = first?.spec.role === 'hole' ? [first, second] : [second, first];
    if (!hole || !shaft || hole.spec.nominalNm === undefined || shaft.spec.nominalNm === undefined) return null;
    return <BoreShaftDiagram check={check} hole={hole} shaft={shaft} readings={readings} deviationUnit={deviationUnit} />;
  }
  return null;
}

/** Limits as deviations from `zeroNm`, µm: an explicit max/min, or an ISO class looked up with the public calculator. */
function useZone(feature: ChecklistFeature, zeroNm: number, fromIsoFit: ZoneUm | null): ZoneUm | null {
  const nominalNm = feature.spec.nominalNm ?? zeroNm;
  const toleranceClass = feature.spec.toleranceClass;
  const lookup = useQuery({
    ...fitCheckQueries.zone(nominalNm / 1_000_000, toleranceClass ?? ''),
    enabled: fromIsoFit === null && Boolean(toleranceClass),
  });
  // A part whose nominal differs from the hole's sits off the zero line by the difference.
  const offsetUm = (nominalNm - zeroNm) / 1000;
  if (fromIsoFit) return fromIsoFit;
  if (feature.spec.maxNm !== undefined && feature.spec.minNm !== undefined) {
    return { upper: (feature.spec.maxNm - zeroNm) / 1000, lower: (feature.spec.minNm - zeroNm) / 1000 };
  }
  if (toleranceClass && lookup.data) return { upper: lookup.data.upper + offsetUm, lower: lookup.data.lower + offsetUm };
  return null;
}

function BoreShaftDiagram({
  check,
  hole,
  shaft,
  readings,
  deviationUnit,
}: {
  check: FitCheck;
  hole: ChecklistFeature;
  shaft: ChecklistFeature;
  readings: Reading[];
  deviationUnit: DeviationUnit;
}) {
  const detail = readBoreShaft(check);
  const zeroNm = hole.spec.nominalNm!;
  const holeZone = useZone(hole, zeroNm, detail?.isoFit?.hole ?? null);
  const shaftZone = useZone(shaft, zeroNm, detail?.isoFit?.shaft ?? null);
  const deviations = (featureId: string) =>
    readings.filter((reading) => reading.featureId === featureId).map((reading) => (reading.valueNm - zeroNm) / 1000);
  const describeClass = (feature: ChecklistFeature) =>
    feature.spec.toleranceClass ?? (feature.spec.maxNm !== undefined ? 'given limits' : undefined);

  return (
    <ToleranceZoneDiagram
      title={check.title}
      nominal={formatReadableLength(zeroNm, hole.unit)}
      hole={holeZone}
      shaft={shaftZone}
      holeClass={describeClass(hole)}
      shaftClass={describeClass(shaft)}
      measuredHole={deviations(hole.id)}
      measuredShaft={deviations(shaft.id)}
      unit={deviationUnit}
    />
  );
}
