import { unitLabel } from '@/lib/units';
import type { FeatureKind, PartCategory, PartFeature, PartSource } from '../api/queries';

export const CATEGORY_LABELS: Record<PartCategory, string> = {
  coupler: 'Coupler',
  shaft: 'Shaft',
  joint: 'Joint',
  bearing: 'Bearing',
  bore: 'Bore',
  plate: 'Plate',
  boot: 'Boot',
  seal: 'Seal',
  fastener: 'Fastener',
  other: 'Other',
};

export const SOURCE_LABELS: Record<PartSource, string> = {
  new: 'New',
  remanufactured: 'Remanufactured',
  used: 'Used',
  original_equipment: 'Original equipment',
};

export const FEATURE_KIND_LABELS: Record<FeatureKind, string> = {
  spline: 'Spline',
  diameter: 'Diameter',
  length: 'Length',
  free: 'Other attribute',
};

/** One line a machinist would write: "21-tooth external, 16/32 DP", "hole 15 mm H7". */
export function describeFeature(feature: PartFeature): string {
  const unit = unitLabel(feature.unit);
  switch (feature.kind) {
    case 'spline': {
      const pitch = feature.shown.pitch ? `, ${feature.shown.pitch}` : ', pitch not known';
      const major = feature.shown.majorDiameter ? `, major ⌀ ${feature.shown.majorDiameter} ${unit}` : '';
      return `${feature.spec.teeth}-tooth ${feature.spec.gender}${pitch}${major}`;
    }
    case 'diameter': {
      const tolerance = feature.spec.toleranceClass
        ? ` ${feature.spec.toleranceClass}`
        : feature.shown.min && feature.shown.max
          ? ` (${feature.shown.min} to ${feature.shown.max} ${unit})`
          : ', no tolerance given';
      return `${feature.spec.role === 'hole' ? 'Hole' : 'Shaft'} ⌀ ${feature.shown.nominal} ${unit}${tolerance}`;
    }
    case 'length': {
      const plunge =
        feature.shown.compressed && feature.shown.extended
          ? `, plunges ${feature.shown.compressed} to ${feature.shown.extended} ${unit}`
          : '';
      return `Overall ${feature.shown.length} ${unit}${plunge}`;
    }
    case 'free':
      return feature.spec.unit ? `${feature.spec.value} ${feature.spec.unit}` : feature.spec.value;
  }
}
