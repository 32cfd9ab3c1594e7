import type { Logger } from '@nestjs/common';
import { setTimeout as sleep } from 'node:timers/promises';
import type { DataSource } from 'typeorm';

interface AcceptedRecord {
  id: string;
  reply: string;
  /** Give up recording after this (the lease is nearly gone): the start mark stays and the next claim counts it uncertain. */
  deadline: number;
}

/**
 * Writes a relay's sends down with one statement per message instead of two: the record of a connection's
 * last accepted message travels in the same UPDATE as the "about to send" mark of its next one (plus any
 * other connection's records waiting at that moment). A connection asks to start its next message only after
 * handing in its last answer, so each connection has at most one message started and not yet recorded:
 * the duplicate window stays one message per connection.
 */
export class DeliveryRecorder {
  /** Set when a write failed: nothing new should start in this round (claims lapse and are taken again). */
  databaseDown = false;
  private accepted: AcceptedRecord[] = [];

  constructor(
    private readonly dataSource: DataSource,
    private readonly owner: string,
    private readonly leaseMs: number,
    private readonly logger: Logger,
  ) {}

  /** The server accepted this claimed delivery: it is recorded as sent with the next write. */
  recordAccepted(id: string, reply: string): void {
    this.accepted.push({ id, reply, deadline: Date.now() + this.leaseMs - 2_000 });
  }

  /**
   * Writes down that this claimed delivery is about to go to the server, while its lease is still live,
   * together with the accepted records waiting. False when the lease lapsed (another relay may have it now)
   * or the database could not be reached: then this process must not send it.
   */
  async startAttempt(id: string): Promise<boolean> {
    const accepted = this.accepted.splice(0);
    try {
      return (await this.write(accepted, [id])).has(id);
    } catch (error) {
      this.databaseDown = true;
      this.keepForRetry(accepted, error);
      return false;
    }
  }

  /**
   * Records what is still waiting. The server already holds those messages, so a moment's outage (a
   * restart) must not make them look unsent: keep trying while their claims last.
   */
  async settled(): Promise<void> {
    for (let failures = 0; this.accepted.length; ) {
      const accepted = this.accepted.splice(0);
      try {
        await this.write(accepted, []);
      } catch (error) {
        this.databaseDown = true;
        this.keepForRetry(accepted, error);
        failures += 1;
        if (this.accepted.length) await sleep(Math.min(2_000, 250 * 2 ** (failures - 1)));
      }
    }
  }

  private keepForRetry(accepted: AcceptedRecord[], error: unknown): void {
    const now = Date.now();
    for (const record of accepted) {
      if (record.deadline > now) this.accepted.push(record);
      else this.logger.warn(`mail ${record.id} was accepted but could not be recorded as sent: ${error instanceof Error ? error.message : String(error)}`);
    }
  }

  /** One statement: the accepted ones become sent, the started ones get their mark. Returns the ids marked started. */
  private async write(accepted: AcceptedRecord[], startIds: string[]): Promise<Set<string>> {
    const sentIds = accepted.map((record) => record.id);
    const isSent = sentIds.length ? 'id IN (?)' : 'FALSE';
    const sent = sentIds.length ? [sentIds] : [];
    const replies = accepted.map(() => 'WHEN ? THEN ?').join(' ');
    const replyParams = accepted.flatMap((record) => [record.id, record.reply]);
    const result = (await this.dataSource.query(
      `UPDATE mail_deliveries SET
         state = IF(${isSent}, 'sent', state),
         sent_at = IF(${isSent}, NOW(3), sent_at),
         sent_by = IF(${isSent}, ?, sent_by),
         attempts = attempts + (${isSent}),
         smtp_reply = ${accepted.length ? `CASE id ${replies} ELSE smtp_reply END` : 'smtp_reply'},
         body_text = IF(${isSent}, '', body_text),
         body_html = IF(${isSent}, NULL, body_html),
         lease_owner = IF(${isSent}, NULL, lease_owner),
         attempt_started_at = IF(${isSent}, NULL, NOW(3)),
         lease_until = IF(${isSent}, NULL, lease_until)
       WHERE lease_owner = ? AND (${isSent} OR (${startIds.length ? 'id IN (?)' : 'FALSE'} AND lease_until > NOW(3)))`,
      [
        ...sent,
        ...sent,
        ...sent,
        this.owner,
        ...sent,
        ...replyParams,
        ...sent,
        ...sent,
        ...sent,
        ...sent,
        ...sent,
        this.owner,
        ...sent,
        ...(startIds.length ? [startIds] : []),
      ],
    )) as { affectedRows?: number };
    if (!startIds.length) return new Set();
    // Usually every row matched. Otherwise some lease lapsed (or an accepted one was taken over): ask which
    // starts were written; a row this process marked keeps its owner and its mark until its answer is recorded.
    if ((result.affectedRows ?? 0) === accepted.length + startIds.length) return new Set(startIds);
    const rows = (await this.dataSource.query(
      'SELECT id FROM mail_deliveries WHERE id IN (?) AND lease_owner = ? AND attempt_started_at IS NOT NULL',
      [startIds, this.owner],
    )) as { id: string }[];
    return new Set(rows.map((row) => row.id));
  }
}
