import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { IsIn, IsInt, IsNumber, IsOptional, IsPositive, IsString, Max, MaxLength, Min, ValidateIf } from 'class-validator';
import { NumberFromText } from '../../common/decorators/number-from-text.decorator';
import { MAX_PITCH_TEXT_LENGTH, MAX_SPLINE_TEETH, MIN_SPLINE_TEETH } from '../../engine';

const TEETH_MESSAGE = `teeth must be a whole number from ${MIN_SPLINE_TEETH} to ${MAX_SPLINE_TEETH}`;

export class SplineDimensionsQueryDto {
  @ApiProperty({ example: 21, minimum: MIN_SPLINE_TEETH, maximum: MAX_SPLINE_TEETH })
  @NumberFromText()
  @IsInt({ message: TEETH_MESSAGE })
  @Min(MIN_SPLINE_TEETH, { message: TEETH_MESSAGE })
  @Max(MAX_SPLINE_TEETH, { message: TEETH_MESSAGE })
  teeth!: number;

  @ApiProperty({
    example: '16/32',
    maxLength: MAX_PITCH_TEXT_LENGTH,
    description: 'ANSI B92.1 diametral pitch written `16/32` or `20 DP`, or an ISO 4156 module written `m1.25`',
  })
  @IsString({ message: 'pitch must be text such as 16/32, 20 DP or m1.25' })
  @MaxLength(MAX_PITCH_TEXT_LENGTH, { message: `pitch must be at most ${MAX_PITCH_TEXT_LENGTH} characters` })
  pitch!: string;

  @ApiPropertyOptional({ enum: [30, 37.5, 45], default: 30, description: 'Pressure angle, degrees' })
  @NumberFromText()
  @IsIn([30, 37.5, 45], { message: 'pressureAngle must be 30, 37.5 or 45' })
  pressureAngle: 30 | 37.5 | 45 = 30;

  @ApiPropertyOptional({
    enum: ['flat', 'fillet'],
    description: 'Default: flat for 30°, fillet for 37.5° and 45° (which have fillet roots only)',
  })
  @IsOptional()
  @IsIn(['flat', 'fillet'], { message: 'root must be flat or fillet' })
  root?: 'flat' | 'fillet';

  @ApiPropertyOptional({ enum: ['side', 'major'], default: 'side', description: 'major: ANSI B92.1 30° flat-root major-diameter fit' })
  @IsIn(['side', 'major'], { message: 'fit must be side or major' })
  fit: 'side' | 'major' = 'side';
}

export class SplineIdentifyQueryDto {
  @ApiProperty({ example: 20, minimum: MIN_SPLINE_TEETH, maximum: MAX_SPLINE_TEETH })
  @NumberFromText()
  @IsInt({ message: TEETH_MESSAGE })
  @Min(MIN_SPLINE_TEETH, { message: TEETH_MESSAGE })
  @Max(MAX_SPLINE_TEETH, { message: TEETH_MESSAGE })
  teeth!: number;

  @ApiPropertyOptional({ example: 26.67, description: "Measured major (outside) diameter of a shaft's spline, in `unit`; give this or minorDiameter" })
  @ValidateIf((query: SplineIdentifyQueryDto) => query.minorDiameter === undefined || query.majorDiameter !== undefined)
  @NumberFromText()
  @IsNumber({ allowNaN: false, allowInfinity: false }, { message: 'majorDiameter must be a number (or give minorDiameter instead)' })
  @IsPositive({ message: 'majorDiameter must be greater than zero' })
  majorDiameter?: number;

  @ApiPropertyOptional({ example: 1.25, description: "Measured minor diameter (the bore) of a hub's spline, in `unit`" })
  @IsOptional()
  @NumberFromText()
  @IsNumber({ allowNaN: false, allowInfinity: false }, { message: 'minorDiameter must be a number' })
  @IsPositive({ message: 'minorDiameter must be greater than zero' })
  minorDiameter?: number;

  @ApiProperty({ enum: ['mm', 'in'], example: 'mm', description: 'Unit of the reading' })
  @IsIn(['mm', 'in'], { message: 'unit must be mm or in' })
  unit!: 'mm' | 'in';

  @ApiPropertyOptional({ example: 0.01, description: "The instrument's resolution in `unit`; default 0.01 mm or 0.001 in (a common caliper)" })
  @IsOptional()
  @NumberFromText()
  @IsNumber({ allowNaN: false, allowInfinity: false }, { message: 'resolution must be a number' })
  @IsPositive({ message: 'resolution must be greater than zero' })
  resolution?: number;
}

// ---- response shapes (OpenAPI) ----

class ConvertedLengthDto {
  @ApiProperty({ example: 34.925 }) value!: number;
  @ApiProperty({ enum: ['in', 'mm'] }) unit!: 'in' | 'mm';
}

export class SplineLengthDto {
  @ApiProperty({ example: 1.375, description: "In the designation's own unit" }) value!: number;
  @ApiProperty({ enum: ['in', 'mm'] }) unit!: 'in' | 'mm';
  @ApiProperty({ type: ConvertedLengthDto, description: 'The same length in the other unit (1 in = 25.4 mm exactly)' })
  converted!: ConvertedLengthDto;
}

class SplineDimensionSetDto {
  @ApiProperty({ type: SplineLengthDto, description: 'D = N/P (ANSI B92.1) or m·z (ISO 4156)' }) pitchDiameter!: SplineLengthDto;
  @ApiProperty({ type: SplineLengthDto, description: 'Db = D cos(pressure angle)' }) baseDiameter!: SplineLengthDto;
  @ApiProperty({ type: SplineLengthDto, description: 'π/P or π·m' }) circularPitch!: SplineLengthDto;
  @ApiProperty({ type: SplineLengthDto }) basicSpaceWidth!: SplineLengthDto;
  @ApiProperty({ type: SplineLengthDto }) basicToothThickness!: SplineLengthDto;
  @ApiProperty({ type: SplineLengthDto }) internalMajorDiameter!: SplineLengthDto;
  @ApiProperty({ type: SplineLengthDto }) externalMajorDiameter!: SplineLengthDto;
  @ApiProperty({ type: SplineLengthDto }) internalMinorDiameter!: SplineLengthDto;
  @ApiProperty({ type: SplineLengthDto }) externalMinorDiameter!: SplineLengthDto;
  @ApiProperty({ type: SplineLengthDto }) internalFormDiameter!: SplineLengthDto;
  @ApiProperty({ type: SplineLengthDto }) externalFormDiameter!: SplineLengthDto;
  @ApiProperty({ type: SplineLengthDto, description: 'Radial form clearance cF' }) formClearance!: SplineLengthDto;
}

export class SplineDimensionsDto {
  @ApiProperty({ example: '21T 16/32 DP 30° flat root side fit (ANSI B92.1)' }) designation!: string;
  @ApiProperty({ enum: ['ANSI B92.1', 'ISO 4156 / ANSI B92.2M'] }) standard!: string;
  @ApiProperty({ example: 21 }) teeth!: number;
  @ApiProperty({ example: '16/32' }) pitch!: string;
  @ApiProperty({ enum: [30, 37.5, 45] }) pressureAngle!: number;
  @ApiProperty({ enum: ['flat', 'fillet'] }) root!: string;
  @ApiProperty({ enum: ['side', 'major'] }) fit!: string;
  @ApiProperty({ enum: ['in', 'mm'] }) unit!: string;
  @ApiProperty({ type: SplineDimensionSetDto }) dimensions!: SplineDimensionSetDto;
  @ApiProperty({ type: [String], description: 'The formulas used and what is simplified' }) notes!: string[];
}

class DeviationDto {
  @ApiProperty({ example: -0.42, description: 'Reading − basic diameter' }) value!: number;
  @ApiProperty({ enum: ['in', 'mm'] }) unit!: string;
}

class SplineCandidateDto {
  @ApiProperty({ example: '20T 20/40 DP 30° flat root side fit (ANSI B92.1)' }) designation!: string;
  @ApiProperty({ enum: ['ANSI B92.1', 'ISO 4156 / ANSI B92.2M'] }) standard!: string;
  @ApiProperty({ example: '20/40' }) pitch!: string;
  @ApiProperty({ enum: [30, 37.5, 45] }) pressureAngle!: number;
  @ApiProperty({ enum: ['flat', 'fillet'] }) root!: string;
  @ApiProperty({ type: [String], description: 'Other forms with the same basic diameter' }) alsoFits!: string[];
  @ApiProperty({ type: SplineLengthDto }) basicDiameter!: SplineLengthDto;
  @ApiProperty({ type: DeviationDto }) deviation!: DeviationDto;
  @ApiProperty({ description: "Whether the reading lies inside the window of the `rule`" }) explainsReading!: boolean;
}

class MeasuredDto {
  @ApiProperty({ example: 26.67 }) value!: number;
  @ApiProperty({ enum: ['in', 'mm'] }) unit!: string;
  @ApiProperty({ example: 0.01 }) resolution!: number;
}

export class SplineIdentificationDto {
  @ApiProperty({ example: 20 }) teeth!: number;
  @ApiProperty({ enum: ['major', 'minor'] }) feature!: string;
  @ApiProperty({ type: MeasuredDto }) measured!: MeasuredDto;
  @ApiProperty({ type: [SplineCandidateDto], description: 'Best first, by the size of the deviation' }) candidates!: SplineCandidateDto[];
  @ApiProperty({ type: [String], description: 'Warnings such as the inch/metric swap' }) pitfalls!: string[];
  @ApiProperty({ description: 'How explainsReading is decided' }) rule!: string;
}
