import { Column, Entity, Index, PrimaryColumn } from 'typeorm';
import { CreatedAtColumn, newId, UpdatedAtColumn } from '../../common/database/columns';
import { SKILL_LEVELS, type SkillLevel } from '../../engine/guide-effort';
import type { SafetyTopic } from '../../engine/safety-topics';

/**
 * A build guide being written. What viewers read is the snapshot in its published revision;
 * `publishedRevisionId` is null while a guide is a draft or after it was withdrawn.
 */
@Entity('guides')
@Index(['workshopId', 'slug'], { unique: true })
@Index(['buildId'])
@Index(['publishedRevisionId', 'workshopId', 'buildId'])
export class Guide {
  @PrimaryColumn({ type: 'char', length: 36 })
  id: string = newId();

  @Column({ name: 'workshop_id', type: 'char', length: 36 })
  workshopId!: string;

  @Column({ name: 'build_id', type: 'char', length: 36 })
  buildId!: string;

  @Column({ type: 'varchar', length: 200 })
  title!: string;

  @Column({ type: 'varchar', length: 120 })
  slug!: string;

  /** Sanitised HTML. */
  @Column({ type: 'mediumtext' })
  summary!: string;

  /** The footage the viewer follows. */
  @Column({ name: 'footage_id', type: 'char', length: 36, nullable: true })
  footageId!: string | null;

  /** Its verified-fit checklist and parts list go in the guide. */
  @Column({ name: 'assembly_id', type: 'char', length: 36, nullable: true })
  assemblyId!: string | null;

  @Column({ name: 'safety_topics', type: 'json' })
  safetyTopics!: SafetyTopic[];

  @Column({ type: 'json' })
  tools!: string[];

  @Column({ type: 'json' })
  consumables!: string[];

  /** What the reader should already be able to do; null until the author says. */
  @Column({ name: 'skill_level', type: 'enum', enum: SKILL_LEVELS, nullable: true })
  skillLevel!: SkillLevel | null;

  /** The author's estimate of the whole job, in minutes. */
  @Column({ name: 'estimated_minutes', type: 'smallint', unsigned: true, nullable: true })
  estimatedMinutes!: number | null;

  @Column({ name: 'published_revision_id', type: 'char', length: 36, nullable: true })
  publishedRevisionId!: string | null;

  @Column({ name: 'created_by', type: 'char', length: 36, nullable: true })
  createdBy!: string | null;

  @CreatedAtColumn()
  createdAt!: Date;

  @UpdatedAtColumn()
  updatedAt!: Date;
}
