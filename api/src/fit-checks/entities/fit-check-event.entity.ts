import { Column, Entity, Index, PrimaryColumn } from 'typeorm';
import { CreatedAtColumn, newId } from '../../common/database/columns';
import type { FitCheckState } from '../../engine/checklist';

/** The history of a check: every state change with who (or which re-evaluation) and why. */
@Entity('fit_check_events')
@Index(['fitCheckId', 'createdAt'])
export class FitCheckEvent {
  @PrimaryColumn({ type: 'char', length: 36 })
  id: string = newId();

  @Column({ name: 'fit_check_id', type: 'char', length: 36 })
  fitCheckId!: string;

  @Column({ name: 'from_state', type: 'varchar', length: 16, nullable: true })
  fromState!: FitCheckState | null;

  @Column({ name: 'to_state', type: 'varchar', length: 16 })
  toState!: FitCheckState;

  @Column({ type: 'varchar', length: 500 })
  reason!: string;

  /** Null when the engine changed the state after a part or measurement changed. */
  @Column({ name: 'actor_id', type: 'char', length: 36, nullable: true })
  actorId!: string | null;

  @CreatedAtColumn()
  createdAt!: Date;
}
