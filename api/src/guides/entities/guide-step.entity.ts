import { Column, Entity, Index, PrimaryColumn } from 'typeorm';
import { CreatedAtColumn, newId, UpdatedAtColumn } from '../../common/database/columns';
import { CAUTION_LEVELS, type CautionLevel } from '../../engine/safety-topics';

/** One step of a guide, optionally anchored to a moment of a footage and carrying a caution. */
@Entity('guide_steps')
@Index(['guideId', 'position'])
export class GuideStep {
  @PrimaryColumn({ type: 'char', length: 36 })
  id: string = newId();

  @Column({ name: 'guide_id', type: 'char', length: 36 })
  guideId!: string;

  /** 1-based order within the guide. */
  @Column({ type: 'int', unsigned: true })
  position!: number;

  @Column({ type: 'varchar', length: 200 })
  title!: string;

  /** Sanitised HTML. */
  @Column({ type: 'mediumtext' })
  body!: string;

  @Column({ name: 'footage_id', type: 'char', length: 36, nullable: true })
  footageId!: string | null;

  @Column({ name: 'start_ms', type: 'int', unsigned: true, nullable: true })
  startMs!: number | null;

  @Column({ name: 'end_ms', type: 'int', unsigned: true, nullable: true })
  endMs!: number | null;

  @Column({ name: 'caution_level', type: 'enum', enum: CAUTION_LEVELS, nullable: true })
  cautionLevel!: CautionLevel | null;

  @Column({ name: 'caution_text', type: 'varchar', length: 1000, default: '' })
  cautionText!: string;

  /** The author's estimate of this step, in minutes. */
  @Column({ name: 'estimated_minutes', type: 'smallint', unsigned: true, nullable: true })
  estimatedMinutes!: number | null;

  @CreatedAtColumn()
  createdAt!: Date;

  @UpdatedAtColumn()
  updatedAt!: Date;
}
