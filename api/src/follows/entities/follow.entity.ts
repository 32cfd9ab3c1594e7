import { Column, Entity, Index, PrimaryColumn } from 'typeorm';
import { CreatedAtColumn, newId } from '../../common/database/columns';

export const FOLLOW_TARGET_KINDS = ['workshop', 'build', 'assembly'] as const;
export type FollowTargetKind = (typeof FOLLOW_TARGET_KINDS)[number];

/** How a follow's news comes: each change at once, gathered in a daily or weekly digest, or not at all for now. */
export const FOLLOW_DELIVERIES = ['at_once', 'daily', 'weekly', 'paused'] as const;
export type FollowDelivery = (typeof FOLLOW_DELIVERIES)[number];

/** A person follows a workshop, a build or an assembly, to be e-mailed when a fit there is confirmed or fails. */
@Entity('follows')
@Index(['userId', 'targetKind', 'targetId'], { unique: true })
@Index(['targetKind', 'targetId'])
export class Follow {
  @PrimaryColumn({ type: 'char', length: 36 })
  id: string = newId();

  @Column({ name: 'user_id', type: 'char', length: 36 })
  userId!: string;

  /** The workshop the target belongs to (the target itself for a workshop). */
  @Column({ name: 'workshop_id', type: 'char', length: 36 })
  workshopId!: string;

  @Column({ name: 'target_kind', type: 'enum', enum: FOLLOW_TARGET_KINDS })
  targetKind!: FollowTargetKind;

  @Column({ name: 'target_id', type: 'char', length: 36 })
  targetId!: string;

  @Column({ type: 'enum', enum: FOLLOW_DELIVERIES, default: 'at_once' })
  delivery!: FollowDelivery;

  @CreatedAtColumn()
  createdAt!: Date;
}
