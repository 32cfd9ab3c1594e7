import { describeFeatureSpec } from './feature-spec';
import { PartFeature } from './entities/part-feature.entity';
import { Part } from './entities/part.entity';
import { photoIdOf } from '../common/uploads/photo-id';

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
    /** Each photo's address on this API, which redirects to a short-lived storage link. */
    photos: part.photoKeys.map((key) => {
      const id = photoIdOf(key);
      return { id, url: `/api/workshops/${part.workshopId}/parts/${part.id}/photos/${id}` };
    }),
    features: (part.features ?? []).sort((a, b) => a.name.localeCompare(b.name)).map(toFeatureResponse),
    createdAt: part.createdAt.toISOString(),
    updatedAt: part.updatedAt.toISOString(),
  };
}

export type PartResponse = ReturnType<typeof toPartResponse>;
export type FeatureResponse = ReturnType<typeof toFeatureResponse>;
