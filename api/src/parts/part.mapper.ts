import { describeFeatureSpec } from './feature-spec';
import { PartFeature } from './entities/part-feature.entity';
import { Part } from './entities/part.entity';
import { photoIdOf } from '../common/uploads/photo-id';
import type { DiameterSpec, FreeSpec, LengthSpec, SplineSpec } from './entities/part-feature.entity';
import type { PartFeatureResponse, PartResponseDto } from './dto/part-response.dto';

export function toFeatureResponse(feature: PartFeature): PartFeatureResponse {
  const base = {
    id: feature.id,
    partId: feature.partId,
    name: feature.name,
    unit: feature.displayUnit,
    shown: describeFeatureSpec(feature.kind, feature.spec, feature.displayUnit),
  };
  // The stored spec's shape follows the kind (toFeatureSpec writes it so); the column type cannot say which.
  switch (feature.kind) {
    case 'spline':
      return { ...base, kind: 'spline', spec: feature.spec as SplineSpec };
    case 'diameter':
      return { ...base, kind: 'diameter', spec: feature.spec as DiameterSpec };
    case 'length':
      return { ...base, kind: 'length', spec: feature.spec as LengthSpec };
    case 'free':
      return { ...base, kind: 'free', spec: feature.spec as FreeSpec };
  }
}

export function toPartResponse(part: Part): PartResponseDto {
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
