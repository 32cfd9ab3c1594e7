import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import {
  IsDateString,
  IsIn,
  IsInt,
  IsNumber,
  IsOptional,
  IsString,
  IsUUID,
  Matches,
  Max,
  MaxLength,
  Min,
} from 'class-validator';
import { MAX_FOOTAGE_MS } from '../../common/http/limits';
import { LENGTH_UNITS, type LengthUnit } from '../../engine/units';
import { INSTRUMENT_KINDS, QUANTITIES, type InstrumentKind, type Quantity } from '../entities/measurement.entity';

const READING = /^\s*-?(\d+(\.\d*)?|\.\d+)\s*$/;

export class CreateMeasurementDto {
  @ApiPropertyOptional({ description: 'The part feature measured (give this or interfaceId)' })
  @IsOptional()
  @IsUUID()
  featureId?: string;

  @ApiPropertyOptional({ description: 'The interface measured, e.g. a clearance between two parts' })
  @IsOptional()
  @IsUUID()
  interfaceId?: string;

  @ApiProperty({ enum: QUANTITIES })
  @IsIn(QUANTITIES)
  quantity!: Quantity;

  @ApiProperty({ example: '0.6692', description: 'The reading exactly as taken, in `unit`' })
  @Matches(READING, { message: 'value must be a decimal number such as 0.6692' })
  value!: string;

  @ApiProperty({ enum: LENGTH_UNITS })
  @IsIn(LENGTH_UNITS)
  unit!: LengthUnit;

  @ApiProperty({ enum: INSTRUMENT_KINDS })
  @IsIn(INSTRUMENT_KINDS)
  instrumentKind!: InstrumentKind;

  @ApiProperty({ example: '0.0001', description: "The instrument's smallest step, in `unit`" })
  @Matches(READING, { message: 'resolution must be a decimal number such as 0.0001' })
  resolution!: string;

  @ApiPropertyOptional({ example: '2026-09-14' })
  @IsOptional()
  @IsDateString({ strict: true }, { message: 'calibratedOn must be a date such as 2026-09-14' })
  calibratedOn?: string;

  @ApiPropertyOptional({ example: '0–1 in outside micrometer, ratchet stop' })
  @IsOptional()
  @IsString()
  @MaxLength(200)
  instrumentNote?: string;

  @ApiPropertyOptional({ example: 20.5 })
  @IsOptional()
  @IsNumber({ allowNaN: false, allowInfinity: false })
  @Min(-60)
  @Max(200)
  temperatureC?: number;

  @ApiPropertyOptional({ description: 'When it was taken (defaults to now)' })
  @IsOptional()
  @IsDateString()
  takenAt?: string;

  @ApiPropertyOptional({ description: 'The footage that shows the reading' })
  @IsOptional()
  @IsUUID()
  footageId?: string;

  @ApiPropertyOptional({ example: 95000, description: 'Time in that footage, ms' })
  @IsOptional()
  @IsInt()
  @Min(0)
  @Max(MAX_FOOTAGE_MS, { message: '$property must be at most 86400000 (24 hours, in ms)' })
  footageTimeMs?: number;

  @ApiPropertyOptional()
  @IsOptional()
  @IsString()
  @MaxLength(500)
  note?: string;
}

export class ListMeasurementsQueryDto {
  @ApiPropertyOptional()
  @IsOptional()
  @IsUUID()
  featureId?: string;

  @ApiPropertyOptional()
  @IsOptional()
  @IsUUID()
  interfaceId?: string;
}
