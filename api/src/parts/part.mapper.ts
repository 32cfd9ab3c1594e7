import { describeFeatureSpec } from './feature-spec';
import { PartFeature } from './entities/part-feature.entity';
import { Part } from './entities/part.entity';

export function toFeatureResponse(feature: PartFeature) {
  return {
    id: feature.id,
    partId: feature.partId,
    name: feature.name,
    kind: feature.kind,
    unit: feature.displayUnit,
    spec: feature.spec,
    shown: describeFeatureSpec(feature.kind, feature.spec, feature.displayUnit),
  };
}

export function toPartResponse(part: Part) {
  return {
    id: part.id,
    workshopId: part.workshopId,
    partNumber: part.partNumber,
    maker: part.maker,
    title: part.title,
    category: part.category,
    source: part.source,
    notes: part.notes,
    photoKeys: part.photoKeys,
    features: (part.features ?? []).sort((a, b) => a.name.localeCompare(b.name)).map(toFeatureResponse),
    createdAt: part.createdAt.toISOString(),
    updatedAt: part.updatedAt.toISOString(),
  };
}

export type PartResponse = ReturnType<typeof toPartResponse>;
export type FeatureResponse = ReturnType<typeof toFeatureResponse>;
