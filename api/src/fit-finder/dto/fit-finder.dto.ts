import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { IsIn, IsInt, IsOptional, IsString, Matches, Max, MaxLength, Min } from 'class-validator';
import { NumberFromText } from '../../common/decorators/number-from-text.decorator';
import { MAX_PITCH_TEXT_LENGTH, SPLINE_PRESSURE_ANGLES, type SplinePressureAngle } from '../../engine/splines';
import { LENGTH_UNITS, type LengthUnit } from '../../engine/units';
import type { FinderVerdict } from '../../engine/fit-finder';

export const MAX_FINDER_PAGE = 50;
export const MAX_FINDER_OFFSET = 10_000;
/** A length as people write it; the engine reads it exactly (bounded here so nothing long reaches a parser). */
const LENGTH_TEXT = 'a length such as 0.750 in, 19.05 mm, 3/4" or 15 thou';

/**
 * What a reader has, in trade terms. Every field is optional, but at least one must be given:
 * part number or maker, vehicle, spline (teeth, pitch, pressure angle, fit), diameter (a size with an
 * ISO 286 class, or a measured size; with `fit` the interface's clearance is checked against that class),
 * or a length window. Lengths carry their unit ("0.750 in"); `unit` applies to those written without one.
 */
export class FitFinderQueryDto {
  @ApiPropertyOptional({ example: 'HL-2107', description: 'part number; spacing and dashes ignored' })
  @IsOptional()
  @IsString()
  @MaxLength(80)
  partNumber?: string;

  @ApiPropertyOptional({ example: 'Ostler Motor Works' })
  @IsOptional()
  @IsString()
  @MaxLength(120)
  maker?: string;

  @ApiPropertyOptional({ example: 'compact pickup', description: 'words of the build’s vehicle' })
  @IsOptional()
  @IsString()
  @MaxLength(120)
  vehicle?: string;

  @ApiPropertyOptional({ example: 21, description: 'spline tooth count' })
  @IsOptional()
  @NumberFromText()
  @IsInt({ message: 'splineTeeth must be a whole number' })
  @Min(4)
  @Max(200)
  splineTeeth?: number;

  @ApiPropertyOptional({ example: '16/32', description: 'diametral pitch (16/32, 20 DP) or module (m1.25)' })
  @IsOptional()
  @IsString()
  @MaxLength(MAX_PITCH_TEXT_LENGTH)
  splinePitch?: string;

  @ApiPropertyOptional({ enum: SPLINE_PRESSURE_ANGLES, description: 'degrees' })
  @IsOptional()
  @NumberFromText()
  @IsIn(SPLINE_PRESSURE_ANGLES, { message: 'pressureAngle must be 30, 37.5 or 45' })
  pressureAngle?: SplinePressureAngle;

  @ApiPropertyOptional({ enum: ['side', 'major'] })
  @IsOptional()
  @IsIn(['side', 'major'], { message: 'splineFit must be side or major' })
  splineFit?: 'side' | 'major';

  @ApiPropertyOptional({ example: '0.5906 in', description: `a diameter: ${LENGTH_TEXT}` })
  @IsOptional()
  @IsString()
  @MaxLength(40)
  diameter?: string;

  @ApiPropertyOptional({ example: 'H7', description: 'ISO 286 class of the diameter (H7 a bore, g6 a shaft); without it the diameter is a measured size' })
  @IsOptional()
  @Matches(/^([A-Z]{1,2}\d{1,2}|[a-z]{1,2}\d{1,2})$/, { message: 'toleranceClass must be an ISO 286 class such as H7 or g6' })
  toleranceClass?: string;

  @ApiPropertyOptional({ example: 'H7/g6', description: 'the fit you want at that diameter: bore/shaft interfaces are judged by their clearance' })
  @IsOptional()
  @Matches(/^[A-Z]{1,2}\d{1,2}\/[a-z]{1,2}\d{1,2}$/, { message: 'fit must be a hole and a shaft class such as H7/g6' })
  fit?: string;

  @ApiPropertyOptional({ example: '525 mm', description: `shortest installed length: ${LENGTH_TEXT}` })
  @IsOptional()
  @IsString()
  @MaxLength(40)
  lengthMin?: string;

  @ApiPropertyOptional({ example: '21.5 in', description: 'longest installed length' })
  @IsOptional()
  @IsString()
  @MaxLength(40)
  lengthMax?: string;

  @ApiPropertyOptional({ enum: LENGTH_UNITS, description: 'unit for lengths written without one' })
  @IsOptional()
  @IsIn(LENGTH_UNITS)
  unit?: LengthUnit;

  @ApiPropertyOptional({ default: 20, maximum: MAX_FINDER_PAGE })
  @IsOptional()
  @NumberFromText()
  @IsInt()
  @Min(1)
  @Max(MAX_FINDER_PAGE)
  limit?: number;

  @ApiPropertyOptional({ default: 0, maximum: MAX_FINDER_OFFSET })
  @IsOptional()
  @NumberFromText()
  @IsInt()
  @Min(0)
  @Max(MAX_FINDER_OFFSET)
  offset?: number;
}

export class FinderMeasurementDto {
  @ApiProperty({ example: 'OM-G5-IN pilot nose' }) feature!: string;
  @ApiProperty({ example: '0.5902 in', description: 'as taken, in its unit and to its instrument’s resolution' }) value!: string;
  @ApiProperty({ enum: LENGTH_UNITS }) unit!: LengthUnit;
  @ApiProperty({ description: 'the same length in millimetres, exactly' }) millimetres!: number;
  @ApiProperty({ example: 'outside_micrometer' }) instrument!: string;
  @ApiProperty() takenAt!: string;
}

export class FinderCheckDto {
  @ApiProperty({ format: 'uuid' }) id!: string;
  @ApiProperty({ example: 'Spline match: coupler to gearbox input' }) title!: string;
  @ApiProperty({ enum: ['spline', 'diameter', 'clearance', 'length', 'part'], description: 'which part of the query this check answers' })
  criterion!: 'spline' | 'diameter' | 'clearance' | 'length' | 'part';
  @ApiProperty({ enum: ['open', 'bench_pass', 'confirmed', 'no_fit'] }) state!: string;
  @ApiProperty({ enum: ['match', 'near_miss'] }) verdict!: Exclude<FinderVerdict, 'no_match'>;
  @ApiProperty({ type: [String], description: 'why it matches, or what differs' }) reasons!: string[];
  @ApiProperty({ type: [FinderMeasurementDto] }) measurements!: FinderMeasurementDto[];
  @ApiProperty({ nullable: true, type: String }) confirmedAt!: string | null;
  @ApiProperty({ nullable: true, type: String, description: 'who confirmed it, when the workshop shows names publicly' })
  confirmedBy!: string | null;
  @ApiProperty({ nullable: true, type: Number, description: 'seconds into the guide’s video where the evidence is' })
  evidenceAtSeconds!: number | null;
}

class FinderWorkshopDto {
  @ApiProperty() name!: string;
  @ApiProperty() slug!: string;
}

class FinderGuideDto {
  @ApiProperty() title!: string;
  @ApiProperty() slug!: string;
  @ApiProperty({ example: '/guides/harrow-lane-garage/fitting-the-21-tooth-coupler-stack' }) path!: string;
  @ApiProperty() revision!: number;
  @ApiProperty() publishedAt!: string;
}

class FinderFitReportsDto {
  @ApiProperty({ description: 'readers’ reports that it fit (declined ones left out)' }) fit!: number;
  @ApiProperty({ description: 'readers’ reports that it did not fit' }) noFit!: number;
}

export class FitFinderResultDto {
  @ApiProperty({ enum: ['match', 'near_miss'] }) verdict!: Exclude<FinderVerdict, 'no_match'>;
  @ApiProperty({ enum: ['confirmed', 'bench_pass', 'open', 'no_fit'], description: 'the least proven state among the matching checks' })
  state!: string;
  @ApiProperty({ type: FinderWorkshopDto }) workshop!: FinderWorkshopDto;
  @ApiProperty({ type: FinderGuideDto }) guide!: FinderGuideDto;
  @ApiProperty() buildTitle!: string;
  @ApiProperty() vehicle!: string;
  @ApiProperty({ example: '21-tooth coupler stack' }) assembly!: string;
  @ApiProperty({ type: [FinderCheckDto] }) checks!: FinderCheckDto[];
  @ApiProperty({ type: FinderFitReportsDto }) fitReports!: FinderFitReportsDto;
  @ApiProperty({ example: '/guides/harrow-lane-garage/fitting-the-21-tooth-coupler-stack?t=41.5', description: 'opens the guide at the evidence moment' })
  link!: string;
}

export class FitFinderAnswerDto {
  @ApiProperty({ type: [String], example: ['spline: 21 teeth, 16/32 diametral pitch (ANSI B92.1)'], description: 'the query as understood' })
  understood!: string[];
  @ApiProperty({ description: 'matching results in all (among the best-ranked 1,000 candidates per criterion: see totalCapped)' }) total!: number;
  @ApiProperty({ description: 'true when a criterion had more candidates than the finder judges (1,000): total counts the best-ranked of them, and more may match' })
  totalCapped!: boolean;
  @ApiProperty() offset!: number;
  @ApiProperty() limit!: number;
  @ApiProperty({ type: [FitFinderResultDto], description: 'confirmed first, then bench-passed, then open' }) results!: FitFinderResultDto[];
  @ApiProperty({ description: 'near misses in all (among the best-ranked 200 near-miss candidates: see nearMissCapped)' }) nearMissTotal!: number;
  @ApiProperty({ description: 'true when the near-miss candidates filled their window (200): more near misses may exist' })
  nearMissCapped!: boolean;
  @ApiProperty({ type: [FitFinderResultDto], description: 'the first near misses, each with its reason (same page size, from the start)' })
  nearMisses!: FitFinderResultDto[];
}
