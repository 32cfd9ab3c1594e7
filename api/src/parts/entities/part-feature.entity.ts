import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryColumn } from 'typeorm';
import { CreatedAtColumn, newId, UpdatedAtColumn } from '../../common/database/columns';
import type { SplineFit, SplinePressureAngle } from '../../engine/splines';
import type { LengthUnit } from '../../engine/units';
import { Part } from './part.entity';

export const SPLINE_TOLERANCE_CLASSES = [4, 5, 6, 7] as const;
export type SplineToleranceClass = (typeof SPLINE_TOLERANCE_CLASSES)[number];

export const FEATURE_KINDS = ['spline', 'diameter', 'length', 'free'] as const;
export type FeatureKind = (typeof FEATURE_KINDS)[number];

/** A spline: tooth count, which side, and where known its pitch (ANSI B92.1 diametral or ISO 4156 module). */
export interface SplineSpec {
  teeth: number;
  gender: 'internal' | 'external';
  /** Diametral pitch P (the numerator of a fractional pitch such as 16/32). */
  diametralPitch?: number;
  /** Stub pitch (the denominator of 16/32), kept for the record. */
  stubPitch?: number;
  /** Module m in millimetres. */
  module?: number;
  /** Pressure angle in degrees: 30, 37.5 or 45 in both standards. */
  pressureAngle?: SplinePressureAngle;
  /** Side fit or major-diameter fit (ANSI B92.1; ISO 4156 splines here are side fit). */
  fit?: SplineFit;
  /** Tolerance class 4, 5, 6 or 7 (ANSI B92.1 and ISO 4156 use the same numbers). */
  toleranceClass?: SplineToleranceClass;
  majorDiameterNm?: number;
}

/** A diameter: a bore (hole) or a shaft, its nominal size and tolerance (ISO 286 class or explicit limits). */
export interface DiameterSpec {
  role: 'hole' | 'shaft';
  nominalNm: number;
  toleranceClass?: string;
  /** Explicit limits as absolute sizes, when the maker gives them instead of a class. */
  maxNm?: number;
  minNm?: number;
}

/** A length: overall length and, for a plunging shaft, its compressed and extended lengths. */
export interface LengthSpec {
  lengthNm: number;
  compressedNm?: number;
  extendedNm?: number;
}

export interface FreeSpec {
  value: string;
  unit?: string;
}

export type FeatureSpec = SplineSpec | DiameterSpec | LengthSpec | FreeSpec;

/** A named, typed attribute of a part: the thing measurements and interfaces refer to. */
@Entity('part_features')
@Index(['partId', 'name'], { unique: true })
export class PartFeature {
  @PrimaryColumn({ type: 'char', length: 36 })
  id: string = newId();

  @Column({ name: 'part_id', type: 'char', length: 36 })
  partId!: string;

  @ManyToOne(() => Part, (part) => part.features, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'part_id' })
  part?: Part;

  /** e.g. "input spline", "pilot bore", "overall length". */
  @Column({ type: 'varchar', length: 120 })
  name!: string;

  @Column({ type: 'enum', enum: FEATURE_KINDS })
  kind!: FeatureKind;

  @Column({ type: 'json' })
  spec!: FeatureSpec;

  /** The unit the creator works in for this feature; lengths are stored in nanometres regardless. */
  @Column({ name: 'display_unit', type: 'varchar', length: 8, default: 'mm' })
  displayUnit!: LengthUnit;

  @CreatedAtColumn()
  createdAt!: Date;

  @UpdatedAtColumn()
  updatedAt!: Date;
}
