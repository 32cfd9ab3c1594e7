import { Column, Entity, Index, PrimaryColumn } from 'typeorm';
import { CreatedAtColumn, decimalTransformer, nanometresTransformer, newId } from '../../common/database/columns';
import type { LengthUnit } from '../../engine/units';

export const QUANTITIES = ['diameter', 'length', 'clearance', 'runout', 'other'] as const;
export type Quantity = (typeof QUANTITIES)[number];
export const INSTRUMENT_KINDS = [
  'outside_micrometer',
  'inside_micrometer',
  'bore_gauge',
  'caliper',
  'dial_indicator',
  'feeler_gauge',
  'tape',
  'other',
] as const;
export type InstrumentKind = (typeof INSTRUMENT_KINDS)[number];

/**
 * One reading of a part feature or an interface. The value is kept exactly as taken
 * (text and unit) and in integer nanometres for arithmetic, so a 0.0001 in reading never drifts.
 */
@Entity('measurements')
@Index(['workshopId', 'featureId'])
@Index(['workshopId', 'interfaceId'])
export class Measurement {
  @PrimaryColumn({ type: 'char', length: 36 })
  id: string = newId();

  @Column({ name: 'workshop_id', type: 'char', length: 36 })
  workshopId!: string;

  @Column({ name: 'feature_id', type: 'char', length: 36, nullable: true })
  featureId!: string | null;

  @Column({ name: 'interface_id', type: 'char', length: 36, nullable: true })
  interfaceId!: string | null;

  @Column({ type: 'enum', enum: QUANTITIES })
  quantity!: Quantity;

  /** As written by the person who took it, e.g. "1.2505". */
  @Column({ name: 'value_text', type: 'varchar', length: 40 })
  valueText!: string;

  @Column({ type: 'varchar', length: 8 })
  unit!: LengthUnit;

  @Column({ name: 'value_nm', type: 'bigint', transformer: nanometresTransformer })
  valueNm!: number;

  @Column({ name: 'instrument_kind', type: 'enum', enum: INSTRUMENT_KINDS })
  instrumentKind!: InstrumentKind;

  @Column({ name: 'instrument_resolution_nm', type: 'bigint', transformer: nanometresTransformer })
  instrumentResolutionNm!: number;

  @Column({ name: 'instrument_calibrated_on', type: 'date', nullable: true })
  instrumentCalibratedOn!: string | null;

  @Column({ name: 'instrument_note', type: 'varchar', length: 200, default: '' })
  instrumentNote!: string;

  @Column({ name: 'temperature_c', type: 'decimal', precision: 5, scale: 1, nullable: true, transformer: decimalTransformer })
  temperatureC!: number | null;

  @Column({ name: 'taken_by', type: 'char', length: 36, nullable: true })
  takenBy!: string | null;

  @Column({ name: 'taken_at', type: 'datetime', precision: 3 })
  takenAt!: Date;

  /** The moment in a footage that shows this reading. */
  @Column({ name: 'footage_id', type: 'char', length: 36, nullable: true })
  footageId!: string | null;

  @Column({ name: 'footage_time_ms', type: 'int', unsigned: true, nullable: true })
  footageTimeMs!: number | null;

  @Column({ type: 'varchar', length: 500, default: '' })
  note!: string;

  @CreatedAtColumn()
  createdAt!: Date;
}
