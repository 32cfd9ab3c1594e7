import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import {
  IsDateString,
  IsIn,
  IsInt,
  IsNumber,
  IsOptional,
  IsString,
  Matches,
  Max,
  MaxLength,
  Min,
} from 'class-validator';
import { OptionalUuid } from '../../common/decorators/nullable-fields.decorator';
import { MAX_FOOTAGE_MS } from '../../common/http/limits';
import { LENGTH_UNITS, type LengthUnit } from '../../engine/units';
import { INSTRUMENT_KINDS, QUANTITIES, type InstrumentKind, type Quantity } from '../entities/measurement.entity';

const READING = /^\s*-?(\d+(\.\d*)?|\.\d+)\s*$/;

export class CreateMeasurementDto {
  @OptionalUuid('The part feature measured (give this or interfaceId)')
  featureId?: string;

  @OptionalUuid('The interface measured, e.g. a clearance between two parts')
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

  @OptionalUuid('The footage that shows the reading')
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
  @OptionalUuid()
  featureId?: string;

  @OptionalUuid()
  interfaceId?: string;
}

export class InstrumentResponseDto {
  @ApiProperty({ enum: INSTRUMENT_KINDS }) kind!: InstrumentKind;
  @ApiProperty({ example: 2540 }) resolutionNm!: number;
  @ApiProperty({ example: '0.0001', description: 'The resolution in the reading’s unit' }) resolution!: string;
  @ApiProperty({ type: String, nullable: true, example: '2026-03-02' }) calibratedOn!: string | null;
  @ApiProperty({ example: '' }) note!: string;
}

export class MeasurementResponseDto {
  @ApiProperty({ format: 'uuid' }) id!: string;
  @ApiProperty({ type: String, format: 'uuid', nullable: true }) featureId!: string | null;
  @ApiProperty({ type: String, format: 'uuid', nullable: true }) interfaceId!: string | null;
  @ApiProperty({ enum: QUANTITIES }) quantity!: Quantity;
  @ApiProperty({ example: '1.2505', description: 'As written by the person who took it' }) value!: string;
  @ApiProperty({ enum: LENGTH_UNITS }) unit!: LengthUnit;
  @ApiProperty({ example: 31_762_700, description: 'The reading in integer nanometres' }) valueNm!: number;
  @ApiProperty({ example: '1.2505 in', description: 'In its unit, with as many decimals as the instrument resolves' }) shown!: string;
  @ApiProperty({ type: InstrumentResponseDto }) instrument!: InstrumentResponseDto;
  @ApiProperty({ type: Number, nullable: true, example: 21.5 }) temperatureC!: number | null;
  @ApiProperty({ type: String, format: 'uuid', nullable: true, description: 'The member who took it' }) takenBy!: string | null;
  @ApiProperty({ format: 'date-time' }) takenAt!: string;
  @ApiProperty({ type: String, format: 'uuid', nullable: true }) footageId!: string | null;
  @ApiProperty({ type: Number, nullable: true, description: 'The moment in the footage that shows the reading' }) footageTimeMs!: number | null;
  @ApiProperty({ example: '' }) note!: string;
}

export class MeasurementSummaryDto {
  @ApiProperty({ example: 3 }) count!: number;
  @ApiProperty({ enum: LENGTH_UNITS, description: 'The unit of the latest reading' }) unit!: LengthUnit;
  @ApiProperty() meanNm!: number;
  @ApiProperty() spreadNm!: number;
  @ApiProperty({ example: '1.2505 in' }) mean!: string;
  @ApiProperty({ example: '0.0002 in' }) spread!: string;
}

export class MeasurementListDto {
  @ApiProperty({ type: [MeasurementResponseDto], description: 'Oldest first' }) measurements!: MeasurementResponseDto[];
  @ApiProperty({ type: MeasurementSummaryDto, nullable: true, description: 'Mean and spread when one subject (feature or interface) is asked for' })
  summary!: MeasurementSummaryDto | null;
}
