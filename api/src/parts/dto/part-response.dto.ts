import { ApiExtraModels, ApiProperty, ApiPropertyOptional, getSchemaPath } from '@nestjs/swagger';
import { LENGTH_UNITS, type LengthUnit } from '../../engine/units';
import { SPLINE_PRESSURE_ANGLES, type SplineFit, type SplinePressureAngle } from '../../engine/splines';
import {
  SPLINE_TOLERANCE_CLASSES,
  type DiameterSpec,
  type FreeSpec,
  type LengthSpec,
  type SplineSpec,
  type SplineToleranceClass,
} from '../entities/part-feature.entity';
import { PART_CATEGORIES, PART_SOURCES, type PartCategory, type PartSource } from '../part-vocabulary';

// The stored specs as they leave the API: lengths in integer nanometres. Each class implements the entity's
// interface, so a field added to a spec without its documentation fails the type check.

export class SplineSpecDto implements SplineSpec {
  @ApiProperty({ example: 21 }) teeth!: number;
  @ApiProperty({ enum: ['internal', 'external'] }) gender!: 'internal' | 'external';
  @ApiPropertyOptional({ example: 16, description: 'ANSI B92.1 diametral pitch' }) diametralPitch?: number;
  @ApiPropertyOptional({ example: 32 }) stubPitch?: number;
  @ApiPropertyOptional({ example: 1.25, description: 'ISO 4156 module, mm' }) module?: number;
  @ApiPropertyOptional({ enum: SPLINE_PRESSURE_ANGLES, example: 30 }) pressureAngle?: SplinePressureAngle;
  @ApiPropertyOptional({ enum: ['side', 'major'] }) fit?: SplineFit;
  @ApiPropertyOptional({ enum: SPLINE_TOLERANCE_CLASSES, example: 5 }) toleranceClass?: SplineToleranceClass;
  @ApiPropertyOptional({ example: 34_925_000 }) majorDiameterNm?: number;
}

export class DiameterSpecDto implements DiameterSpec {
  @ApiProperty({ enum: ['hole', 'shaft'] }) role!: 'hole' | 'shaft';
  @ApiProperty({ example: 15_000_000 }) nominalNm!: number;
  @ApiPropertyOptional({ example: 'H7', description: 'ISO 286 tolerance class' }) toleranceClass?: string;
  @ApiPropertyOptional({ example: 15_018_000 }) maxNm?: number;
  @ApiPropertyOptional({ example: 15_000_000 }) minNm?: number;
}

export class LengthSpecDto implements LengthSpec {
  @ApiProperty({ example: 540_000_000 }) lengthNm!: number;
  @ApiPropertyOptional({ example: 520_000_000 }) compressedNm?: number;
  @ApiPropertyOptional({ example: 565_000_000 }) extendedNm?: number;
}

export class FreeSpecDto implements FreeSpec {
  @ApiProperty({ example: 'M10 x 1.25' }) value!: string;
  @ApiPropertyOptional({ example: 'N·m' }) unit?: string;
}

class PartFeatureBaseDto {
  @ApiProperty({ format: 'uuid' }) id!: string;
  @ApiProperty({ format: 'uuid' }) partId!: string;
  @ApiProperty({ example: 'input spline' }) name!: string;
  @ApiProperty({ enum: LENGTH_UNITS, description: 'The unit the feature is written in' }) unit!: LengthUnit;
  @ApiProperty({
    type: 'object',
    additionalProperties: { type: 'string' },
    example: { majorDiameter: '1.375', pitch: '16/32 DP', standard: 'ANSI B92.1' },
    description: "The spec's lengths written in `unit` (keys without the Nm), and for a spline its pitch, standard, angle, fit and class",
  })
  shown!: Record<string, string>;
}

export class SplineFeatureResponseDto extends PartFeatureBaseDto {
  @ApiProperty({ enum: ['spline'] }) kind!: 'spline';
  @ApiProperty({ type: SplineSpecDto }) spec!: SplineSpecDto;
}

export class DiameterFeatureResponseDto extends PartFeatureBaseDto {
  @ApiProperty({ enum: ['diameter'] }) kind!: 'diameter';
  @ApiProperty({ type: DiameterSpecDto }) spec!: DiameterSpecDto;
}

export class LengthFeatureResponseDto extends PartFeatureBaseDto {
  @ApiProperty({ enum: ['length'] }) kind!: 'length';
  @ApiProperty({ type: LengthSpecDto }) spec!: LengthSpecDto;
}

export class FreeFeatureResponseDto extends PartFeatureBaseDto {
  @ApiProperty({ enum: ['free'] }) kind!: 'free';
  @ApiProperty({ type: FreeSpecDto }) spec!: FreeSpecDto;
}

/** A part feature: its spec's shape follows its kind. */
export type PartFeatureResponse = SplineFeatureResponseDto | DiameterFeatureResponseDto | LengthFeatureResponseDto | FreeFeatureResponseDto;

export const FEATURE_RESPONSE_MODELS = [SplineFeatureResponseDto, DiameterFeatureResponseDto, LengthFeatureResponseDto, FreeFeatureResponseDto];

/** One schema for "a feature of any kind", told apart by `kind`, for @ApiOkResponse({ schema }) and nested properties. */
export const PART_FEATURE_SCHEMA = {
  oneOf: FEATURE_RESPONSE_MODELS.map((model) => ({ $ref: getSchemaPath(model) })),
  discriminator: {
    propertyName: 'kind',
    mapping: {
      spline: getSchemaPath(SplineFeatureResponseDto),
      diameter: getSchemaPath(DiameterFeatureResponseDto),
      length: getSchemaPath(LengthFeatureResponseDto),
      free: getSchemaPath(FreeFeatureResponseDto),
    },
  },
};

export class PartPhotoDto {
  @ApiProperty({ format: 'uuid' }) id!: string;
  @ApiProperty({
    example: '/api/workshops/6f1c…/parts/0b7e…/photos/5d2a…',
    description: 'Address on this API that redirects to a short-lived storage link',
  })
  url!: string;
}

@ApiExtraModels(...FEATURE_RESPONSE_MODELS)
export class PartResponseDto {
  @ApiProperty({ format: 'uuid' }) id!: string;
  @ApiProperty({ format: 'uuid' }) workshopId!: string;
  @ApiProperty({ example: 'HL-2107' }) partNumber!: string;
  @ApiProperty({ example: 'Brackwater Driveline' }) maker!: string;
  @ApiProperty({ example: '27-tooth motor coupler' }) title!: string;
  @ApiProperty({ enum: PART_CATEGORIES }) category!: PartCategory;
  @ApiProperty({ enum: PART_SOURCES }) source!: PartSource;
  @ApiProperty({ example: '' }) notes!: string;
  @ApiProperty({ type: [PartPhotoDto] }) photos!: PartPhotoDto[];
  @ApiProperty({ type: 'array', items: PART_FEATURE_SCHEMA, description: 'By name' }) features!: PartFeatureResponse[];
  @ApiProperty({ format: 'date-time' }) createdAt!: string;
  @ApiProperty({ format: 'date-time' }) updatedAt!: string;
}
