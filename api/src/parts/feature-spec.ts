import { BadRequestException } from '@nestjs/common';
import { EngineError } from '../engine/engine-error';
import { formatLengthValue, toNanometres, type LengthUnit } from '../engine/units';
import { FeatureInputDto } from './dto/part.dto';
import type { DiameterSpec, FeatureKind, FeatureSpec, FreeSpec, LengthSpec, SplineSpec } from './entities/part-feature.entity';

/** Turns a feature as typed (decimal strings in one unit) into its stored spec (integer nanometres). */
export function toFeatureSpec(input: FeatureInputDto): FeatureSpec {
  const unit = input.unit ?? 'mm';
  const length = (field: keyof FeatureInputDto): number | undefined => {
    const text = input[field];
    if (text === undefined || text === null || text === '') return undefined;
    try {
      return toNanometres(String(text), unit);
    } catch (error) {
      if (error instanceof EngineError) throw new BadRequestException(`${field}: ${error.message}`);
      throw error;
    }
  };
  switch (input.kind) {
    case 'spline': {
      if (input.diametralPitch !== undefined && input.module !== undefined) {
        throw new BadRequestException('A spline has a diametral pitch (ANSI B92.1) or a module (ISO 4156), not both');
      }
      const spec: SplineSpec = { teeth: input.teeth!, gender: input.gender! };
      if (input.diametralPitch !== undefined) spec.diametralPitch = input.diametralPitch;
      if (input.stubPitch !== undefined) spec.stubPitch = input.stubPitch;
      if (input.module !== undefined) spec.module = input.module;
      if (input.pressureAngle !== undefined) spec.pressureAngle = input.pressureAngle;
      if (input.splineFit !== undefined) spec.fit = input.splineFit;
      if (input.splineClass !== undefined) spec.toleranceClass = input.splineClass;
      const major = length('majorDiameter');
      if (major !== undefined) spec.majorDiameterNm = major;
      return spec;
    }
    case 'diameter': {
      const spec: DiameterSpec = { role: input.role!, nominalNm: length('nominal')! };
      if (input.toleranceClass) {
        const isHoleClass = /^[A-Z]/.test(input.toleranceClass);
        if (isHoleClass !== (input.role === 'hole')) {
          throw new BadRequestException(
            `toleranceClass ${input.toleranceClass} is a ${isHoleClass ? 'hole' : 'shaft'} class but the feature is a ${input.role}`,
          );
        }
        spec.toleranceClass = input.toleranceClass;
      }
      const max = length('max');
      const min = length('min');
      if (max !== undefined) spec.maxNm = max;
      if (min !== undefined) spec.minNm = min;
      if (max !== undefined && min !== undefined && min > max) throw new BadRequestException('min must not exceed max');
      return spec;
    }
    case 'length': {
      const spec: LengthSpec = { lengthNm: length('length')! };
      const compressed = length('compressed');
      const extended = length('extended');
      if (compressed !== undefined) spec.compressedNm = compressed;
      if (extended !== undefined) spec.extendedNm = extended;
      if (compressed !== undefined && extended !== undefined && compressed > extended) {
        throw new BadRequestException('compressed length must not exceed extended length');
      }
      return spec;
    }
    case 'free': {
      const spec: FreeSpec = { value: input.value! };
      if (input.freeUnit) spec.unit = input.freeUnit;
      return spec;
    }
  }
}

/** The spec's lengths written in the feature's unit, for people; the nanometre values stay beside them. */
export function describeFeatureSpec(kind: FeatureKind, spec: FeatureSpec, unit: LengthUnit): Record<string, string> {
  const shown: Record<string, string> = {};
  for (const [key, value] of Object.entries(spec)) {
    if (key.endsWith('Nm') && typeof value === 'number') shown[key.slice(0, -2)] = formatLengthValue(value, unit);
  }
  if (kind === 'spline') {
    const spline = spec as SplineSpec;
    if (spline.diametralPitch !== undefined) {
      shown.pitch = spline.stubPitch ? `${spline.diametralPitch}/${spline.stubPitch} DP` : `${spline.diametralPitch} DP`;
    } else if (spline.module !== undefined) {
      shown.pitch = `module ${spline.module}`;
    }
    // The standard follows from the pitch system: diametral pitch is ANSI B92.1, module ISO 4156.
    if (spline.diametralPitch !== undefined) shown.standard = 'ANSI B92.1';
    else if (spline.module !== undefined) shown.standard = 'ISO 4156';
    if (spline.pressureAngle !== undefined) shown.pressureAngle = `${spline.pressureAngle}°`;
    if (spline.fit !== undefined) shown.fit = spline.fit === 'side' ? 'side fit' : 'major-diameter fit';
    if (spline.toleranceClass !== undefined) shown.toleranceClass = `class ${spline.toleranceClass}`;
  }
  return shown;
}
