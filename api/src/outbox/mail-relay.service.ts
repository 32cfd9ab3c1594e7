import { Inject, Injectable, Logger, OnApplicationBootstrap, OnModuleDestroy } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { InjectDataSource } from '@nestjs/typeorm';
import { createHash } from 'node:crypto';
import { setTimeout as sleep } from 'node:timers/promises';
import { DataSource, EntityManager } from 'typeorm';
import { newId } from '../common/database/columns';
import type { AppConfig } from '../config/app-config';
import { MailService, SmtpRefusal } from '../infra/mail/mail.service';
import { DeliveryRecorder } from './delivery-recorder';
import { MailOutbox, type MailDraft } from './mail-outbox.service';

/** Turns one outbox event into the mail it causes; runs inside the relay's transaction (use `manager`). */
export type OutboxExpander = (manager: EntityManager, payload: unknown) => Promise<MailDraft[]>;

/** Told when a server refused a message for good (5xx): the owner of the address may decide to pause it. */
export type RefusalHandler = (refused: { recipient: string; userId: string | null; reply: string }) => Promise<void>;

/** Work the relay does besides sending (digests fall due): runs between batches, at most every `everyMs`. */
export interface RelayChore {
  name: string;
  everyMs: number;
  run: () => Promise<void>;
}

interface DueDelivery {
  id: string;
  user_id: string | null;
  idempotency_key: string;
  recipient: string;
  subject: string;
  body_text: string;
  body_html: string | null;
  headers: string | null;
  attempts: number;
  /** When this process claimed it: no send starts on it after SEND_WINDOW_MS. */
  claimedAt: number;
}

/** Idle wait between looks at the outbox. */
const POLL_MS = 250;
/** Events turned into deliveries per transaction. */
const EVENTS_PER_BATCH = 10;
/** Deliveries a process claims at once, per SMTP connection. */
const CLAIMS_PER_CONNECTION = 20;
/** A claim lapses after this (the process died); another relay then sends what it had not marked sent. */
const LEASE_MS = 30_000;
/** No new send starts after this much of the lease is used, so a live process never outlives its lease. */
const SEND_WINDOW_MS = 15_000;
/** A sending round claims again and again for this long, then lets the loop expand new events and run chores. */
const ROUND_MS = 10_000;
/** A message that keeps failing for reasons other than a refusal (server away) is given up after this many tries. */
const MAX_ATTEMPTS = 12;
const MAX_BACKOFF_MS = 5 * 60_000;

/** The Message-ID a delivery always carries, from its idempotency key: a repeat is recognisably the same message. */
export function messageIdFor(idempotencyKey: string, domain: string): string {
  return `<${createHash('sha256').update(idempotencyKey).digest('hex').slice(0, 40)}@${domain}>`;
}

/** How long to wait before the next try of a message that failed `attempts` times. */
export function backoffMs(attempts: number): number {
  return Math.min(MAX_BACKOFF_MS, 1000 * 2 ** Math.max(0, attempts - 1));
}

/**
 * The outbox relay. In a loop: (1) takes unrelayed outbox events with `SELECT … FOR UPDATE SKIP
 * LOCKED`, expands each into deliveries (unique per idempotency key) and marks it relayed, all in one
 * transaction; (2) claims due deliveries the same way (a lease, so two processes never send the same
 * one and a dead process's claims lapse), sends them through the pooled SMTP transport with bounded
 * concurrency under a per-minute cap counted across processes, claiming the next batch while the last
 * one sends, and marks each sent only after the server accepted it (DeliveryRecorder: that record travels
 * in the same UPDATE as the connection's next start mark).
 *
 * Exactly once up to one window, which is named and counted: each send is written down as started
 * (`attempt_started_at`, under a live lease) before the message goes to the server, and the mark is
 * cleared with the recorded answer. A process that dies (or loses the database) between the server's 250
 * and that record leaves the mark; when its lease lapses the next claim counts the delivery as uncertain
 * (`uncertain_attempts`) and sends it again with the same Message-ID. SMTP has no way to ask a server
 * whether it holds a message, so that repeat cannot be avoided without risking a loss; every other path
 * (a lapsed lease, the database away before the send, the server away) sends nothing twice.
 */
@Injectable()
export class MailRelay implements OnApplicationBootstrap, OnModuleDestroy {
  private readonly logger = new Logger(MailRelay.name);
  private readonly owner = newId();
  private readonly expanders = new Map<string, OutboxExpander>();
  private readonly chores: (RelayChore & { lastRunAt: number })[] = [];
  private readonly refusalHandlers: RefusalHandler[] = [];
  private readonly settings: AppConfig['mail']['relay'];
  private running: Promise<void> | undefined;
  private stopping = false;
  private wake: (() => void) | undefined;

  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    @Inject(MailService) private readonly mail: MailService,
    @Inject(MailOutbox) private readonly outbox: MailOutbox,
    @Inject(ConfigService) config: ConfigService<AppConfig, true>,
  ) {
    this.settings = config.get('mail', { infer: true }).relay;
  }

  /** Called by the domain that owns an event kind, at module init. */
  registerExpander(kind: string, expander: OutboxExpander): void {
    this.expanders.set(kind, expander);
  }

  registerRefusalHandler(handler: RefusalHandler): void {
    this.refusalHandlers.push(handler);
  }

  registerChore(chore: RelayChore): void {
    this.chores.push({ ...chore, lastRunAt: 0 });
  }

  onApplicationBootstrap(): void {
    if (!this.settings.enabled) return;
    this.running = this.loop();
  }

  async onModuleDestroy(): Promise<void> {
    this.stopping = true;
    this.wake?.();
    await this.running;
  }

  /** Everything due now, once: events expanded and deliveries sent. For tests and the benchmark's baseline. */
  async drain(): Promise<void> {
    while ((await this.relayOnce()) > 0) {
      /* keep going */
    }
  }

  private async loop(): Promise<void> {
    let failures = 0;
    while (!this.stopping) {
      let worked = 0;
      try {
        await this.runChores();
        worked = await this.relayOnce();
        failures = 0;
      } catch (error) {
        failures += 1;
        // The database away (restart, network): keep trying, less often, and say so once in a while.
        if (failures === 1 || failures % 20 === 0) this.logger.warn(`relay: ${error instanceof Error ? error.message : String(error)}`);
      }
      if (worked === 0 && !this.stopping) await this.idle(failures ? Math.min(5000, POLL_MS * 2 ** failures) : POLL_MS);
    }
  }

  private async idle(ms: number): Promise<void> {
    const controller = new AbortController();
    this.wake = () => controller.abort();
    await sleep(ms, undefined, { signal: controller.signal }).catch(() => undefined);
    this.wake = undefined;
  }

  private async runChores(): Promise<void> {
    const now = Date.now();
    for (const chore of this.chores) {
      if (now - chore.lastRunAt < chore.everyMs) continue;
      chore.lastRunAt = now;
      await chore.run();
    }
  }

  /** One round; returns how many events and deliveries it handled. */
  async relayOnce(): Promise<number> {
    const expanded = await this.expandEvents();
    if (this.stopping) return expanded;
    return expanded + (await this.sendDue());
  }

  private async expandEvents(): Promise<number> {
    return this.dataSource.transaction(async (manager) => {
      const events = (await manager.query(
        `SELECT id, kind, payload FROM outbox_events WHERE relayed_at IS NULL ORDER BY created_at LIMIT ${EVENTS_PER_BATCH} FOR UPDATE SKIP LOCKED`,
      )) as { id: string; kind: string; payload: string }[];
      const relayed: string[] = [];
      for (const event of events) {
        const expander = this.expanders.get(event.kind);
        if (!expander) continue; // a process that does not know the kind leaves it for one that does
        await this.outbox.sendAll(await expander(manager, JSON.parse(event.payload) as unknown), manager);
        relayed.push(event.id);
      }
      if (relayed.length) await manager.query('UPDATE outbox_events SET relayed_at = NOW(3) WHERE id IN (?)', [relayed]);
      return relayed.length;
    });
  }

  /**
   * Sends what is due for up to ROUND_MS: the connections take deliveries from a local queue that is claimed
   * again while they send (never idle between claims), and their records go down in groups.
   */
  private async sendDue(): Promise<number> {
    const roundStarted = Date.now();
    const batch = this.settings.concurrency * CLAIMS_PER_CONNECTION;
    const held = await this.claim(0);
    if (!held.length) return 0;
    const recorder = new DeliveryRecorder(this.dataSource, this.owner, LEASE_MS, this.logger);
    let handled = held.length;
    let claiming: Promise<void> | undefined;
    let claimsDone = false;
    let claimError: unknown;
    let connectionDown = false;
    const mayClaim = () =>
      !claimsDone && !claimError && !connectionDown && !recorder.databaseDown && !this.stopping && Date.now() - roundStarted < ROUND_MS;
    // The next claim starts while the connections still have half a batch to send.
    const refill = () => {
      claiming ??= this.claim(held.length)
        .then((rows) => {
          held.push(...rows);
          handled += rows.length;
          if (!rows.length) claimsDone = true;
        })
        .catch((error: unknown) => {
          claimError = error;
        })
        .finally(() => {
          claiming = undefined;
        });
      return claiming;
    };
    const work = async () => {
      for (;;) {
        if (held.length <= batch / 2 && mayClaim()) void refill();
        const next = held.shift();
        if (!next) {
          if (!claiming) return;
          await claiming;
          continue;
        }
        // Without the database nothing can be written down, so nothing is sent; the claims lapse unmarked.
        if (recorder.databaseDown) continue;
        if (connectionDown || this.stopping || Date.now() - next.claimedAt > SEND_WINDOW_MS) {
          await this.release(next.id, connectionDown ? 2000 : 0).catch(() => undefined);
          continue;
        }
        // Waits for the record of this connection's last message too: one message unrecorded per connection at most.
        if (!(await recorder.startAttempt(next.id))) continue; // the database is away, or the lease lapsed and another relay has it
        if (await this.deliver(next, recorder)) connectionDown = true;
      }
    };
    await Promise.all(Array.from({ length: this.settings.concurrency }, work));
    await recorder.settled();
    if (recorder.databaseDown) throw new Error('the database went away while sending; unsent claims lapse and are sent by the next claim');
    if (claimError) throw claimError;
    return handled;
  }

  /** Claims due deliveries for this process under a lease, up to a batch and the per-minute cap (counting those it holds). */
  private async claim(holding: number): Promise<DueDelivery[]> {
    const [{ sentLastMinute }] = (await this.dataSource.query(
      'SELECT COUNT(*) AS sentLastMinute FROM mail_deliveries WHERE sent_at > NOW(3) - INTERVAL 1 MINUTE',
    )) as { sentLastMinute: string | number }[];
    const allowed = Math.min(
      this.settings.concurrency * CLAIMS_PER_CONNECTION,
      this.settings.ratePerMinute - Number(sentLastMinute) - holding,
    );
    if (allowed <= 0) return [];
    const claimedAt = Date.now();
    // READ COMMITTED: the scan takes no gap locks, so it never holds up another relay's claim or this one's records.
    const rows = await this.dataSource.transaction('READ COMMITTED', async (manager) => {
      const due = (await manager.query(
        `SELECT id, user_id, idempotency_key, recipient, subject, body_text, body_html, headers, attempts FROM mail_deliveries
          WHERE state = 'pending' AND next_attempt_at <= NOW(3) AND (lease_until IS NULL OR lease_until < NOW(3))
          ORDER BY next_attempt_at LIMIT ${allowed} FOR UPDATE SKIP LOCKED`,
      )) as Omit<DueDelivery, 'claimedAt'>[];
      if (!due.length) return [];
      // A delivery still marked as started was being sent when its relay died: the server may hold it already.
      // It falls due again when its lease lapses, so the next claim's scan of due rows passes over held ones
      // instead of reading (and locking) them.
      await manager.query(
        `UPDATE mail_deliveries SET lease_owner = ?, lease_until = NOW(3) + INTERVAL ${LEASE_MS / 1000} SECOND,
           next_attempt_at = NOW(3) + INTERVAL ${LEASE_MS / 1000} SECOND,
           uncertain_attempts = uncertain_attempts + (attempt_started_at IS NOT NULL), attempt_started_at = NULL
          WHERE id IN (?)`,
        [this.owner, due.map((row) => row.id)],
      );
      return due;
    });
    return rows.map((row) => ({ ...row, claimedAt }));
  }

  /** Sends one claimed delivery; returns true when the SMTP server could not be reached at all. */
  private async deliver(delivery: DueDelivery, recorder: DeliveryRecorder): Promise<boolean> {
    const messageId = messageIdFor(delivery.idempotency_key, this.mail.messageIdDomain);
    try {
      const accepted = await this.mail.send(
        {
          to: delivery.recipient,
          subject: delivery.subject,
          text: delivery.body_text,
          ...(delivery.body_html ? { html: delivery.body_html } : {}),
          ...(delivery.headers ? { headers: JSON.parse(delivery.headers) as Record<string, string> } : {}),
        },
        messageId,
      );
      // Written with this connection's next start mark (and the other connections' records), not on its own.
      recorder.recordAccepted(delivery.id, accepted.reply);
      return false;
    } catch (error) {
      const refusal = error instanceof SmtpRefusal ? error : new SmtpRefusal(String(error), undefined, false);
      const attempts = delivery.attempts + 1;
      const givenUp = refusal.permanent || attempts >= MAX_ATTEMPTS;
      await this.dataSource.query(
        `UPDATE mail_deliveries SET state = ?, attempts = ?, smtp_reply = ?, next_attempt_at = NOW(3) + INTERVAL ? SECOND,
           lease_owner = NULL, lease_until = NULL, attempt_started_at = NULL WHERE id = ? AND lease_owner = ?`,
        [givenUp ? 'failed' : 'pending', attempts, refusal.message.slice(0, 500), backoffMs(attempts) / 1000, delivery.id, this.owner],
      );
      if (givenUp) this.logger.warn(`mail ${delivery.id} not delivered after ${attempts} attempt(s): ${refusal.message}`);
      if (refusal.permanent) {
        for (const handler of this.refusalHandlers) await handler({ recipient: delivery.recipient, userId: delivery.user_id, reply: refusal.message });
      }
      return refusal.responseCode === undefined;
    }
  }

  /** Hands a claimed delivery back unsent (the server is away, or this process stops). */
  private async release(id: string, delayMs: number): Promise<void> {
    await this.dataSource.query(
      'UPDATE mail_deliveries SET lease_owner = NULL, lease_until = NULL, next_attempt_at = NOW(3) + INTERVAL ? SECOND WHERE id = ? AND lease_owner = ?',
      [delayMs / 1000, id, this.owner],
    );
  }
}
