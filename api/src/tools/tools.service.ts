import { BadRequestException, Injectable } from '@nestjs/common';
import { fitLimits, identifySpline, parseSplinePitch, splineBasicDimensions, toNanometres, UnitError } from '../engine';
import { FitLimitsDto, FitQueryDto } from './dto/fit-query.dto';
import { SplineDimensionsQueryDto, SplineIdentifyQueryDto } from './dto/spline-query.dto';

@Injectable()
export class ToolsService {
  calculateFit(query: FitQueryDto): FitLimitsDto {
    const sizeMm = toNanometres(query.size, query.unit) / 1_000_000;
    return fitLimits({ sizeMm, hole: query.hole, shaft: query.shaft }, { jsRounding: query.jsRounding });
  }

  splineDimensions(query: SplineDimensionsQueryDto) {
    return splineBasicDimensions({
      teeth: query.teeth,
      pitch: parseSplinePitch(query.pitch),
      pressureAngle: query.pressureAngle,
      root: query.root ?? (query.pressureAngle === 30 ? 'flat' : 'fillet'),
      fit: query.fit,
    });
  }

  identifySpline(query: SplineIdentifyQueryDto) {
    const feature = query.majorDiameter !== undefined ? 'major' : 'minor';
    const reading = query.majorDiameter ?? query.minorDiameter;
    if (reading === undefined) throw new BadRequestException('give majorDiameter or minorDiameter');
    if (query.majorDiameter !== undefined && query.minorDiameter !== undefined) {
      throw new BadRequestException('give majorDiameter or minorDiameter, not both');
    }
    return identifySpline({
      teeth: query.teeth,
      feature,
      measuredNm: lengthField(`${feature}Diameter`, reading, query.unit),
      unit: query.unit,
      resolutionNm: query.resolution === undefined ? undefined : lengthField('resolution', query.resolution, query.unit),
    });
  }
}

/** Exact nanometres of a query length, or a 400 naming the field (e.g. more decimals than a nanometre). */
function lengthField(field: string, value: number, unit: 'mm' | 'in'): number {
  try {
    return toNanometres(value, unit);
  } catch (error) {
    if (error instanceof UnitError) throw new BadRequestException(`${field}: ${error.message}`);
    throw error;
  }
}
