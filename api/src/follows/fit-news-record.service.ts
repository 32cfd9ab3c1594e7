import { Inject, Injectable, OnModuleInit } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { DataSource } from 'typeorm';
import { FitChecksService } from '../fit-checks/fit-checks.service';
import { MailRelay } from '../outbox/mail-relay.service';
import { NEWS_STATES } from './fit-news.service';

/** Hard refusals (5xx) of one address within this window after which its mail is paused. */
export const HARD_FAILURES_BEFORE_PAUSE = 3;
const HARD_FAILURE_WINDOW_DAYS = 30;

export interface ChangeDeliveryRecord {
  changeId: string;
  to: string;
  changedAt: string;
  told: number;
  pending: number;
  failed: number;
  inDigests: number;
  firstSentAt: string | null;
  lastSentAt: string | null;
  refusals: string[];
}

/**
 * The creator's record of fit news: for each change of a check that was news, how many followers were
 * told and when, how many are still pending or failed (with the servers' answers, never the addresses),
 * and how many wait for a digest; owners may send failed ones again. Also pauses an address whose mail
 * server refused our mail again and again, with a note the person sees on their account page.
 */
@Injectable()
export class FitNewsRecordService implements OnModuleInit {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    @Inject(FitChecksService) private readonly checks: FitChecksService,
    @Inject(MailRelay) private readonly relay: MailRelay,
  ) {}

  onModuleInit(): void {
    this.relay.registerRefusalHandler((refused) => this.pauseAfterRepeatedRefusals(refused.userId, refused.recipient, refused.reply));
  }

  async forCheck(workshopId: string, checkId: string): Promise<ChangeDeliveryRecord[]> {
    const { events } = await this.checks.history(workshopId, checkId);
    const news = events.filter((event) => (NEWS_STATES as readonly string[]).includes(event.toState) && event.fromState !== event.toState);
    if (!news.length) return [];
    const ids = news.map((event) => event.id);
    const counts = (await this.dataSource.query(
      `SELECT fit_check_event_id AS id, SUM(state = 'sent') AS told, SUM(state = 'pending') AS pending, SUM(state = 'failed') AS failed,
              MIN(sent_at) AS firstSentAt, MAX(sent_at) AS lastSentAt
         FROM mail_deliveries WHERE fit_check_event_id IN (?) GROUP BY fit_check_event_id`,
      [ids],
    )) as { id: string; told: string; pending: string; failed: string; firstSentAt: Date | null; lastSentAt: Date | null }[];
    const digests = (await this.dataSource.query(
      'SELECT fit_check_event_id AS id, COUNT(*) AS waiting FROM digest_items WHERE fit_check_event_id IN (?) GROUP BY fit_check_event_id',
      [ids],
    )) as { id: string; waiting: string }[];
    const refusals = (await this.dataSource.query(
      `SELECT fit_check_event_id AS id, smtp_reply AS reply FROM mail_deliveries
        WHERE fit_check_event_id IN (?) AND state = 'failed' ORDER BY created_at LIMIT 50`,
      [ids],
    )) as { id: string; reply: string | null }[];
    return news.map((event) => {
      const count = counts.find((row) => row.id === event.id);
      return {
        changeId: event.id,
        to: event.toState,
        changedAt: event.createdAt.toISOString(),
        told: Number(count?.told ?? 0),
        pending: Number(count?.pending ?? 0),
        failed: Number(count?.failed ?? 0),
        inDigests: Number(digests.find((row) => row.id === event.id)?.waiting ?? 0),
        firstSentAt: count?.firstSentAt ? new Date(count.firstSentAt).toISOString() : null,
        lastSentAt: count?.lastSentAt ? new Date(count.lastSentAt).toISOString() : null,
        refusals: [...new Set(refusals.filter((row) => row.id === event.id).map((row) => row.reply ?? 'refused'))],
      };
    });
  }

  /** Sends the check's failed fit news again (not to addresses whose mail is paused). */
  async retryFailed(workshopId: string, checkId: string): Promise<ChangeDeliveryRecord[]> {
    const record = await this.forCheck(workshopId, checkId);
    const ids = record.filter((change) => change.failed > 0).map((change) => change.changeId);
    if (ids.length) {
      await this.dataSource.query(
        `UPDATE mail_deliveries delivery LEFT JOIN mail_preferences preference ON preference.user_id = delivery.user_id
            SET delivery.state = 'pending', delivery.attempts = 0, delivery.next_attempt_at = NOW(3)
          WHERE delivery.fit_check_event_id IN (?) AND delivery.state = 'failed' AND preference.paused_at IS NULL`,
        [ids],
      );
    }
    return this.forCheck(workshopId, checkId);
  }

  private async pauseAfterRepeatedRefusals(userId: string | null, recipient: string, reply: string): Promise<void> {
    if (!userId) return;
    const [{ refusals }] = (await this.dataSource.query(
      `SELECT COUNT(*) AS refusals FROM mail_deliveries
        WHERE recipient = ? AND state = 'failed' AND smtp_reply IS NOT NULL AND created_at > NOW(3) - INTERVAL ${HARD_FAILURE_WINDOW_DAYS} DAY`,
      [recipient],
    )) as { refusals: string }[];
    if (Number(refusals) < HARD_FAILURES_BEFORE_PAUSE) return;
    const note = `Mail to ${recipient} is paused: its mail server refused our mail ${refusals} times (last answer: ${reply.slice(0, 200)}). Check the address, then resume.`;
    await this.dataSource.query(
      `INSERT INTO mail_preferences (user_id, paused_at, paused_note) VALUES (?, NOW(3), ?)
         ON DUPLICATE KEY UPDATE paused_at = COALESCE(paused_at, NOW(3)), paused_note = VALUES(paused_note)`,
      [userId, note],
    );
  }
}
