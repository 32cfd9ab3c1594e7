import { Column, Entity, Index, PrimaryColumn } from 'typeorm';
import { newId } from '../../common/database/columns';
import type { GuideContent } from '../guide-content';

/** A published state of a guide, kept for good: what viewers read and what a later edit is compared to. */
@Entity('guide_revisions')
@Index(['guideId', 'number'], { unique: true })
export class GuideRevision {
  @PrimaryColumn({ type: 'char', length: 36 })
  id: string = newId();

  @Column({ name: 'guide_id', type: 'char', length: 36 })
  guideId!: string;

  @Column({ type: 'int', unsigned: true })
  number!: number;

  @Column({ type: 'varchar', length: 500, default: '' })
  note!: string;

  @Column({ type: 'json' })
  content!: GuideContent;

  /** SHA-256 of the authored content, to tell whether the draft has changed since. */
  @Column({ name: 'content_hash', type: 'char', length: 64 })
  contentHash!: string;

  @Column({ name: 'published_by', type: 'char', length: 36, nullable: true })
  publishedBy!: string | null;

  @Column({ name: 'published_at', type: 'datetime', precision: 3 })
  publishedAt!: Date;
}
