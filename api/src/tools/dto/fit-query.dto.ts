import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { IsIn, IsNumber, IsOptional, IsPositive, Matches } from 'class-validator';
import { NumberFromText } from '../../common/decorators/number-from-text.decorator';
import type { Clearance, FitConvention, FitKind, FitLimits, JsRounding, Limits } from '../../engine/fits';

export class FitQueryDto {
  @ApiProperty({ example: 25, description: 'Nominal size, in `unit`' })
  @NumberFromText()
  @IsNumber({ allowNaN: false, allowInfinity: false }, { message: 'size must be a number' })
  @IsPositive({ message: 'size must be greater than 0 mm and at most 500 mm' })
  size!: number;

  @ApiProperty({ enum: ['mm', 'in'], default: 'mm' })
  @IsIn(['mm', 'in'], { message: 'unit must be mm or in' })
  unit: 'mm' | 'in' = 'mm';

  @ApiProperty({ example: 'H7', description: 'Hole tolerance class: upper-case letter(s) and IT grade' })
  @Matches(/^[A-Z]{1,2}\d{1,2}$/, { message: 'hole must be a hole tolerance class such as H7' })
  hole!: string;

  @ApiProperty({ example: 'g6', description: 'Shaft tolerance class: lower-case letter(s) and IT grade' })
  @Matches(/^[a-z]{1,2}\d{1,2}$/, { message: 'shaft must be a shaft tolerance class such as g6' })
  shaft!: string;

  @ApiPropertyOptional({
    enum: ['none', 'even'],
    default: 'none',
    description: 'js/JS: `none` gives ±IT/2 as the current ISO 286-2 tables do; `even` rounds odd IT7–IT11 down to even (older practice)',
  })
  @IsOptional()
  @IsIn(['none', 'even'], { message: 'jsRounding must be none or even' })
  jsRounding: 'none' | 'even' = 'none';
}

export class FitDeviationsDto implements Limits {
  @ApiProperty({ example: 21, description: 'Upper deviation (ES for a hole, es for a shaft), µm' }) upper!: number;
  @ApiProperty({ example: 0, description: 'Lower deviation (EI for a hole, ei for a shaft), µm' }) lower!: number;
}

export class FitClearanceDto implements Clearance {
  @ApiProperty({ example: 41, description: 'Largest hole minus smallest shaft, µm' }) max!: number;
  @ApiProperty({ example: 7, description: 'Smallest hole minus largest shaft, µm; negative means interference' }) min!: number;
}

export class FitConventionDto implements FitConvention {
  @ApiProperty({ enum: ['none', 'even'] }) jsRounding!: JsRounding;
  @ApiProperty({ example: 'js/JS = ±IT/2 exactly, as in the current ISO 286-2 tables' }) description!: string;
}

/** ISO 286 limits of a hole and a shaft class at one size (H7/g6 at 25 mm in the examples). */
export class FitLimitsDto implements FitLimits {
  @ApiProperty({ type: FitDeviationsDto }) hole!: FitDeviationsDto;
  @ApiProperty({ type: FitDeviationsDto, example: { upper: -7, lower: -20 } }) shaft!: FitDeviationsDto;
  @ApiProperty({ type: FitClearanceDto }) clearance!: FitClearanceDto;
  @ApiProperty({ enum: ['clearance', 'transition', 'interference'] }) kind!: FitKind;
  @ApiProperty({ type: FitConventionDto, description: 'Which js/JS convention the numbers follow' }) convention!: FitConventionDto;
}
