import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { IsBoolean, IsIn, IsOptional, IsString, IsUUID, Length, Matches, MaxLength, ValidateIf } from 'class-validator';
import { FIT_CHECK_STATES, type FitCheckState } from '../../engine/checklist';
import { LENGTH_UNITS, type LengthUnit } from '../../engine/units';

export class CreateManualCheckDto {
  @ApiProperty({ example: 'Test-fitted on the vehicle: coupler engages fully' })
  @IsString()
  @Length(1, 200)
  title!: string;

  @ApiPropertyOptional({ default: true })
  @IsOptional()
  @IsBoolean()
  required?: boolean;
}

export class TransitionDto {
  @ApiProperty({ enum: FIT_CHECK_STATES, enumName: 'FitCheckState' })
  @IsIn(FIT_CHECK_STATES)
  to!: FitCheckState;

  @ApiProperty({ example: 'Test-fitted with the motor bolted up; turns by hand with no bind.' })
  @IsString()
  @Length(1, 500)
  reason!: string;

  @ApiPropertyOptional({
    enum: FIT_CHECK_STATES,
    enumName: 'FitCheckState',
    description: 'The state the caller saw and expects to leave; if the check is no longer in it, 409 and nothing changes',
  })
  @IsOptional()
  @IsIn(FIT_CHECK_STATES)
  from?: FitCheckState;
}

export class AddEvidenceDto {
  @ApiProperty({ enum: ['measurement', 'mark'], description: 'Photos come through the photos route' })
  @IsIn(['measurement', 'mark'])
  kind!: 'measurement' | 'mark';

  @ApiPropertyOptional({ description: 'For kind `measurement`' })
  @ValidateIf((body: AddEvidenceDto) => body.kind === 'measurement')
  @IsUUID()
  measurementId?: string;

  @ApiPropertyOptional({ description: 'For kind `mark`: a moment in this workshop\'s footage that shows the fit' })
  @ValidateIf((body: AddEvidenceDto) => body.kind === 'mark')
  @IsUUID()
  markId?: string;

  @ApiPropertyOptional()
  @IsOptional()
  @IsString()
  @MaxLength(500)
  note?: string;
}

export class WhatIfQueryDto {
  @ApiProperty({ example: '0.0004', description: 'How much larger the replacement shaft is (negative: smaller)' })
  @Matches(/^\s*-?(\d+(\.\d*)?|\.\d+)\s*$/, { message: 'delta must be a decimal number such as 0.0004' })
  delta!: string;

  @ApiProperty({ enum: LENGTH_UNITS })
  @IsIn(LENGTH_UNITS)
  unit!: LengthUnit;
}

/** The text fields sent beside a photo (multipart form). */
export class PhotoEvidenceDto {
  @ApiPropertyOptional({ example: 'Coupler fully engaged, motor bolted up.' })
  @IsOptional()
  @IsString()
  @MaxLength(500)
  note?: string;
}
