import { ApiProperty, ApiPropertyOptional, OmitType, PartialType } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import {
  ArrayMaxSize,
  IsArray,
  IsIn,
  IsInt,
  IsNumber,
  IsOptional,
  IsPositive,
  IsString,
  Length,
  Matches,
  Max,
  MaxLength,
  Min,
  ValidateIf,
  ValidateNested,
} from 'class-validator';
import { LENGTH_UNITS, type LengthUnit } from '../../engine/units';
import { SPLINE_PRESSURE_ANGLES, type SplineFit, type SplinePressureAngle } from '../../engine/splines';
import { FEATURE_KINDS, SPLINE_TOLERANCE_CLASSES, type FeatureKind, type SplineToleranceClass } from '../entities/part-feature.entity';
import { PART_CATEGORIES, PART_SOURCES, type PartCategory, type PartSource } from '../part-vocabulary';
import { NumberFromText } from '../../common/decorators/number-from-text.decorator';

/** A length written in the feature's unit, e.g. "0.669" with unit "in". Parsed exactly on the server. */
const DECIMAL = /^\s*(\d+(\.\d*)?|\.\d+)(\s+\d+\/\d+)?\s*$|^\s*\d+\/\d+\s*$/;
const DECIMAL_MESSAGE = (field: string) => `${field} must be a number such as 25.4, 0.6690 or 3/8`;

/**
 * One typed attribute of a part. The fields that apply depend on `kind`:
 * spline (teeth, gender, diametralPitch/stubPitch or module, pressureAngle, splineFit, splineClass, majorDiameter), diameter (role, nominal,
 * toleranceClass or max/min), length (length, compressed, extended), free (value, freeUnit).
 */
export class FeatureInputDto {
  @ApiProperty({ example: 'input spline' })
  @IsString()
  @Length(1, 120)
  name!: string;

  @ApiProperty({ enum: FEATURE_KINDS })
  @IsIn(FEATURE_KINDS)
  kind!: FeatureKind;

  @ApiPropertyOptional({ enum: LENGTH_UNITS, default: 'mm', description: 'Unit of every length of this feature' })
  @IsOptional()
  @IsIn(LENGTH_UNITS)
  unit?: LengthUnit;

  @ApiPropertyOptional({ example: 21 })
  @ValidateIf((feature: FeatureInputDto) => feature.kind === 'spline')
  @IsInt({ message: 'teeth must be a whole number' })
  @Min(4)
  @Max(200)
  teeth?: number;

  @ApiPropertyOptional({ enum: ['internal', 'external'] })
  @ValidateIf((feature: FeatureInputDto) => feature.kind === 'spline')
  @IsIn(['internal', 'external'], { message: 'gender must be internal or external' })
  gender?: 'internal' | 'external';

  @ApiPropertyOptional({ example: 16, description: 'ANSI B92.1 diametral pitch P (the 16 of 16/32)' })
  @IsOptional()
  @IsNumber({ allowNaN: false, allowInfinity: false })
  @IsPositive()
  @Max(1000)
  diametralPitch?: number;

  @ApiPropertyOptional({ example: 32, description: 'stub pitch (the 32 of 16/32)' })
  @IsOptional()
  @IsNumber({ allowNaN: false, allowInfinity: false })
  @IsPositive()
  @Max(1000)
  stubPitch?: number;

  @ApiPropertyOptional({ example: 1.25, description: 'ISO 4156 module, mm' })
  @IsOptional()
  @IsNumber({ allowNaN: false, allowInfinity: false })
  @IsPositive()
  @Max(1000)
  module?: number;

  @ApiPropertyOptional({ enum: SPLINE_PRESSURE_ANGLES, example: 30, description: 'spline pressure angle, degrees' })
  @IsOptional()
  @IsIn(SPLINE_PRESSURE_ANGLES, { message: 'pressureAngle must be 30, 37.5 or 45' })
  pressureAngle?: SplinePressureAngle;

  @ApiPropertyOptional({ enum: ['side', 'major'], description: 'spline fit: side fit or major-diameter fit' })
  @IsOptional()
  @IsIn(['side', 'major'], { message: 'splineFit must be side or major' })
  splineFit?: SplineFit;

  @ApiPropertyOptional({ enum: SPLINE_TOLERANCE_CLASSES, description: 'spline tolerance class (ANSI B92.1 / ISO 4156)' })
  @IsOptional()
  @IsIn(SPLINE_TOLERANCE_CLASSES, { message: 'splineClass must be 4, 5, 6 or 7' })
  splineClass?: SplineToleranceClass;

  @ApiPropertyOptional({ example: '1.375' })
  @IsOptional()
  @Matches(DECIMAL, { message: DECIMAL_MESSAGE('majorDiameter') })
  majorDiameter?: string;

  @ApiPropertyOptional({ enum: ['hole', 'shaft'] })
  @ValidateIf((feature: FeatureInputDto) => feature.kind === 'diameter')
  @IsIn(['hole', 'shaft'], { message: 'role must be hole or shaft' })
  role?: 'hole' | 'shaft';

  @ApiPropertyOptional({ example: '15' })
  @ValidateIf((feature: FeatureInputDto) => feature.kind === 'diameter')
  @Matches(DECIMAL, { message: DECIMAL_MESSAGE('nominal') })
  nominal?: string;

  @ApiPropertyOptional({ example: 'H7', description: 'ISO 286 tolerance class' })
  @IsOptional()
  @Matches(/^([A-Z]{1,2}\d{1,2}|[a-z]{1,2}\d{1,2})$/, { message: 'toleranceClass must be an ISO 286 class such as H7 or g6' })
  toleranceClass?: string;

  @ApiPropertyOptional({ example: '15.018', description: 'largest allowed size, when given instead of a class' })
  @IsOptional()
  @Matches(DECIMAL, { message: DECIMAL_MESSAGE('max') })
  max?: string;

  @ApiPropertyOptional({ example: '15.000' })
  @IsOptional()
  @Matches(DECIMAL, { message: DECIMAL_MESSAGE('min') })
  min?: string;

  @ApiPropertyOptional({ example: '540', description: 'overall length' })
  @ValidateIf((feature: FeatureInputDto) => feature.kind === 'length')
  @Matches(DECIMAL, { message: DECIMAL_MESSAGE('length') })
  length?: string;

  @ApiPropertyOptional({ example: '520', description: 'fully compressed length of a plunging shaft' })
  @IsOptional()
  @Matches(DECIMAL, { message: DECIMAL_MESSAGE('compressed') })
  compressed?: string;

  @ApiPropertyOptional({ example: '565', description: 'fully extended length of a plunging shaft' })
  @IsOptional()
  @Matches(DECIMAL, { message: DECIMAL_MESSAGE('extended') })
  extended?: string;

  @ApiPropertyOptional({ example: 'M10 x 1.25' })
  @ValidateIf((feature: FeatureInputDto) => feature.kind === 'free')
  @IsString()
  @Length(1, 200)
  value?: string;

  @ApiPropertyOptional({ example: 'N·m' })
  @IsOptional()
  @IsString()
  @MaxLength(20)
  freeUnit?: string;
}

export class CreatePartDto {
  @ApiProperty({ example: 'HL-2107' })
  @IsString()
  @Length(1, 80)
  @Matches(/[A-Za-z0-9]/, { message: 'partNumber must contain a letter or digit' })
  partNumber!: string;

  @ApiPropertyOptional({ example: 'Brackwater Driveline' })
  @IsOptional()
  @IsString()
  @MaxLength(120)
  maker?: string;

  @ApiProperty({ example: '27-tooth motor coupler' })
  @IsString()
  @Length(1, 200)
  title!: string;

  @ApiProperty({ enum: PART_CATEGORIES })
  @IsIn(PART_CATEGORIES)
  category!: PartCategory;

  @ApiPropertyOptional({ enum: PART_SOURCES, default: 'new' })
  @IsOptional()
  @IsIn(PART_SOURCES)
  source?: PartSource;

  @ApiPropertyOptional()
  @IsOptional()
  @IsString()
  @MaxLength(10000)
  notes?: string;

  @ApiPropertyOptional({ type: [FeatureInputDto] })
  @IsOptional()
  @IsArray()
  @ArrayMaxSize(40)
  @ValidateNested({ each: true })
  @Type(() => FeatureInputDto)
  features?: FeatureInputDto[];
}

/** Features change through their own routes, so each change re-evaluates exactly the checks it touches. */
export class UpdatePartDto extends PartialType(OmitType(CreatePartDto, ['features'] as const)) {}

export class UpdateFeatureDto extends PartialType(FeatureInputDto) {}

export class ListPartsQueryDto {
  @ApiPropertyOptional({ description: 'part number (spacing and dashes ignored), title or maker' })
  @IsOptional()
  @IsString()
  @MaxLength(80)
  q?: string;

  @ApiPropertyOptional({ enum: PART_CATEGORIES })
  @IsOptional()
  @IsIn(PART_CATEGORIES)
  category?: PartCategory;

  @ApiPropertyOptional({ enum: FEATURE_KINDS, description: 'only parts that have a feature of this kind' })
  @IsOptional()
  @IsIn(FEATURE_KINDS)
  featureKind?: FeatureKind;

  @ApiPropertyOptional({ example: 21, description: 'only parts with a spline of this tooth count' })
  @IsOptional()
  @NumberFromText()
  @IsInt()
  @Min(1)
  @Max(200)
  splineTeeth?: number;
}
