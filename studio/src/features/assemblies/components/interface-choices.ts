import type { AssemblyDetail, FeatureInfo, InterfaceKind } from '../api/queries';

export const INTERFACE_KIND_LABELS: Record<InterfaceKind, string> = {
  spline: 'Spline to spline',
  bore_shaft: 'Bore and shaft',
  length_window: 'Length in an installed window',
};

const FEATURE_KIND_FOR: Record<InterfaceKind, FeatureInfo['kind']> = {
  spline: 'spline',
  bore_shaft: 'diameter',
  length_window: 'length',
};

export interface FeatureChoice {
  value: string;
  label: string;
}
export interface FeatureChoiceGroup {
  group: string;
  items: FeatureChoice[];
}

export function featureSummary(feature: FeatureInfo): string {
  switch (feature.kind) {
    case 'spline':
      return `${feature.spec.teeth}-tooth ${feature.spec.gender}`;
    case 'diameter':
      return `${feature.spec.role} ⌀ ${feature.shown.nominal ?? '?'}${feature.spec.toleranceClass ? ` ${feature.spec.toleranceClass}` : ''}`;
    case 'length':
      return feature.shown.compressed && feature.shown.extended
        ? `${feature.shown.compressed}–${feature.shown.extended}`
        : `${feature.shown.length ?? '?'}`;
    case 'free':
      return '';
  }
}

/** May `candidate` mate with `first` in an interface of this kind? The engine still judges the fit. */
function mates(kind: InterfaceKind, first: FeatureInfo, candidate: FeatureInfo): boolean {
  if (candidate.id === first.id) return false;
  if (kind === 'spline') return candidate.spec.gender !== first.spec.gender;
  if (kind === 'bore_shaft') return candidate.spec.role !== first.spec.role;
  return false;
}

/**
 * The features offered for each side of a new interface: only the kind the interface joins, and
 * for the second side only a partner that can mate (an internal spline for an external one, a
 * shaft for a hole). Whether they actually fit is the fit check's verdict, not the form's.
 */
export function interfaceChoices(
  kind: InterfaceKind,
  parts: AssemblyDetail['parts'],
  featureAId: string | null,
): { first: FeatureChoiceGroup[]; second: FeatureChoiceGroup[] } {
  const wanted = FEATURE_KIND_FOR[kind];
  const all = parts.flatMap(({ part }) => part.features);
  const first = all.find((feature) => feature.id === featureAId && feature.kind === wanted) ?? null;
  const group = (keep: (feature: FeatureInfo) => boolean) =>
    parts
      .map(({ position, part }) => ({
        group: `${position} · ${part.partNumber}`,
        items: part.features
          .filter((feature) => feature.kind === wanted && keep(feature))
          .map((feature) => ({ value: feature.id, label: featureChoiceLabel(part, feature) })),
      }))
      .filter((entry) => entry.items.length > 0);
  return {
    first: group(() => true),
    second: kind === 'length_window' || !first ? [] : group((candidate) => mates(kind, first, candidate)),
  };
}

/**
 * A feature as a picker names it: the part first, because once chosen the field shows only this line, and two
 * parts often have features of the same name ("HL-2107 Motor coupler — pilot bore (15 H7)").
 */
export function featureChoiceLabel(part: { partNumber: string; title: string }, feature: FeatureInfo): string {
  const summary = featureSummary(feature);
  return `${part.partNumber} ${part.title} — ${feature.name}${summary ? ` (${summary})` : ''}`;
}

/** "input spline on HL-2107" for a feature id of the assembly. */
export function featureLabel(parts: AssemblyDetail['parts'], featureId: string | null): string {
  for (const { part } of parts) {
    const feature = part.features.find((candidate) => candidate.id === featureId);
    if (feature) return `${feature.name} on ${part.partNumber}`;
  }
  return 'a feature no longer in the assembly';
}
