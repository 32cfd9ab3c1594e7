import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { DataSource, EntityManager } from 'typeorm';
import { newId } from '../common/database/columns';
import type { OutgoingMail } from '../infra/mail/mail.service';
import { MailDelivery } from './entities/mail-delivery.entity';
import { OutboxEvent } from './entities/outbox-event.entity';

export interface MailDraft {
  /** Unique per mail that must go out once: e.g. `fit-news:<change>:<person>`. Omitted: the mail is its own. */
  idempotencyKey?: string;
  kind: string;
  mail: OutgoingMail;
  userId?: string | null;
  fitCheckEventId?: string | null;
}

/** Rows written in one statement at most, so a 10,000-follower fan-out stays a few round trips. */
const INSERT_CHUNK = 500;

/**
 * The one way the product sends mail: write it to the outbox, in the caller's transaction when there
 * is one (pass its EntityManager), and the relay sends it. A draft whose key is already there is
 * skipped, so a repeated write never sends twice.
 */
@Injectable()
export class MailOutbox {
  constructor(@InjectDataSource() private readonly dataSource: DataSource) {}

  /** Queues one mail. Returns whether it was new (false: that key was written before). */
  async send(draft: MailDraft, manager: EntityManager = this.dataSource.manager): Promise<boolean> {
    return (await this.sendAll([draft], manager)) === 1;
  }

  /** Queues many mails; returns how many were new. */
  async sendAll(drafts: MailDraft[], manager: EntityManager = this.dataSource.manager): Promise<number> {
    let written = 0;
    for (let start = 0; start < drafts.length; start += INSERT_CHUNK) {
      const rows = drafts.slice(start, start + INSERT_CHUNK).map((draft) => {
        const id = newId();
        return {
          id,
          idempotencyKey: draft.idempotencyKey ?? `${draft.kind}:${id}`,
          kind: draft.kind,
          recipient: draft.mail.to,
          userId: draft.userId ?? null,
          fitCheckEventId: draft.fitCheckEventId ?? null,
          subject: draft.mail.subject.slice(0, 500),
          bodyText: draft.mail.text,
          bodyHtml: draft.mail.html ?? null,
          headers: draft.mail.headers ? JSON.stringify(draft.mail.headers) : null,
        };
      });
      const result = await manager.createQueryBuilder().insert().into(MailDelivery).values(rows).orIgnore().execute();
      written += (result.raw as { affectedRows?: number }).affectedRows ?? 0;
    }
    return written;
  }

  /** Records an event for the relay to turn into mail (its kind's expander decides who hears). */
  async record(manager: EntityManager, kind: string, payload: object): Promise<void> {
    await manager.insert(OutboxEvent, { id: newId(), kind, payload: JSON.stringify(payload), relayedAt: null });
  }
}
