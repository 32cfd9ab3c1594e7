import { Inject, Injectable, NotFoundException, OnModuleInit } from '@nestjs/common';
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

export interface CheckFitNewsSummary {
  checkId: string;
  checkTitle: string;
  assemblyId: string;
  assemblyName: string;
  changes: number;
  lastChangeTo: string;
  lastChangedAt: string;
  told: number;
  pending: number;
  failed: number;
  inDigests: number;
  uncertain: number;
  firstSentAt: string | null;
  lastSentAt: string | null;
}

export interface BuildFitNewsRecord {
  buildId: string;
  followersTold: number;
  told: number;
  pending: number;
  failed: number;
  inDigests: number;
  uncertain: number;
  firstSentAt: string | null;
  lastSentAt: string | null;
  checks: CheckFitNewsSummary[];
}

const iso = (value: Date | string | null | undefined): string | null => (value ? new Date(value).toISOString() : null);
const earliest = (values: (string | null)[]) => values.filter((value): value is string => !!value).sort()[0] ?? null;
const latest = (values: (string | null)[]) => values.filter((value): value is string => !!value).sort().pop() ?? null;

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

  /**
   * The build page's record: per check of the build with news changes, how its news reached followers,
   * and the build's totals. Counted in the database (a change can have 10,000 deliveries).
   */
  async forBuild(workshopId: string, buildId: string): Promise<BuildFitNewsRecord> {
    await this.buildOf(workshopId, buildId);
    const changes = (await this.dataSource.query(
      `SELECT event.id, event.fit_check_id AS checkId, event.to_state AS toState, event.created_at AS createdAt,
              fit_check.title AS checkTitle, assembly.id AS assemblyId, assembly.name AS assemblyName
         FROM fit_check_events event
         JOIN fit_checks fit_check ON fit_check.id = event.fit_check_id
         JOIN assemblies assembly ON assembly.id = fit_check.assembly_id
        WHERE assembly.build_id = ? AND fit_check.workshop_id = ? AND event.to_state IN (?)
          AND (event.from_state IS NULL OR event.from_state <> event.to_state)
        ORDER BY event.created_at DESC, event.id`,
      [buildId, workshopId, [...NEWS_STATES]],
    )) as { id: string; checkId: string; toState: string; createdAt: Date; checkTitle: string; assemblyId: string; assemblyName: string }[];
    const empty: BuildFitNewsRecord = {
      buildId,
      followersTold: 0,
      told: 0,
      pending: 0,
      failed: 0,
      inDigests: 0,
      uncertain: 0,
      firstSentAt: null,
      lastSentAt: null,
      checks: [],
    };
    if (!changes.length) return empty;
    const ids = changes.map((change) => change.id);
    const counts = (await this.dataSource.query(
      `SELECT event.fit_check_id AS checkId, SUM(delivery.state = 'sent') AS told, SUM(delivery.state = 'pending') AS pending,
              SUM(delivery.state = 'failed') AS failed, SUM(delivery.uncertain_attempts > 0) AS uncertain,
              MIN(delivery.sent_at) AS firstSentAt, MAX(delivery.sent_at) AS lastSentAt
         FROM mail_deliveries delivery JOIN fit_check_events event ON event.id = delivery.fit_check_event_id
        WHERE delivery.fit_check_event_id IN (?) GROUP BY event.fit_check_id`,
      [ids],
    )) as { checkId: string; told: string; pending: string; failed: string; uncertain: string; firstSentAt: Date | null; lastSentAt: Date | null }[];
    const digests = (await this.dataSource.query(
      `SELECT event.fit_check_id AS checkId, COUNT(*) AS waiting
         FROM digest_items item JOIN fit_check_events event ON event.id = item.fit_check_event_id
        WHERE item.fit_check_event_id IN (?) GROUP BY event.fit_check_id`,
      [ids],
    )) as { checkId: string; waiting: string }[];
    const [{ people }] = (await this.dataSource.query(
      "SELECT COUNT(DISTINCT recipient) AS people FROM mail_deliveries WHERE fit_check_event_id IN (?) AND state = 'sent'",
      [ids],
    )) as { people: string }[];
    const checks: CheckFitNewsSummary[] = [];
    for (const change of changes) {
      if (checks.some((check) => check.checkId === change.checkId)) continue; // latest first: the first row of a check is its latest change
      const count = counts.find((row) => row.checkId === change.checkId);
      checks.push({
        checkId: change.checkId,
        checkTitle: change.checkTitle,
        assemblyId: change.assemblyId,
        assemblyName: change.assemblyName,
        changes: changes.filter((row) => row.checkId === change.checkId).length,
        lastChangeTo: change.toState,
        lastChangedAt: new Date(change.createdAt).toISOString(),
        told: Number(count?.told ?? 0),
        pending: Number(count?.pending ?? 0),
        failed: Number(count?.failed ?? 0),
        inDigests: Number(digests.find((row) => row.checkId === change.checkId)?.waiting ?? 0),
        uncertain: Number(count?.uncertain ?? 0),
        firstSentAt: iso(count?.firstSentAt),
        lastSentAt: iso(count?.lastSentAt),
      });
    }
    const sum = (key: 'told' | 'pending' | 'failed' | 'inDigests' | 'uncertain') => checks.reduce((total, check) => total + check[key], 0);
    return {
      ...empty,
      followersTold: Number(people),
      told: sum('told'),
      pending: sum('pending'),
      failed: sum('failed'),
      inDigests: sum('inDigests'),
      uncertain: sum('uncertain'),
      firstSentAt: earliest(checks.map((check) => check.firstSentAt)),
      lastSentAt: latest(checks.map((check) => check.lastSentAt)),
      checks,
    };
  }

  /** Sends the failed fit news of every check of the build again (not to paused addresses); answers the new record. */
  async retryFailedForBuild(workshopId: string, buildId: string): Promise<BuildFitNewsRecord> {
    await this.buildOf(workshopId, buildId);
    await this.dataSource.query(
      `UPDATE mail_deliveries delivery
         JOIN fit_check_events event ON event.id = delivery.fit_check_event_id
         JOIN fit_checks fit_check ON fit_check.id = event.fit_check_id
         JOIN assemblies assembly ON assembly.id = fit_check.assembly_id
         LEFT JOIN mail_preferences preference ON preference.user_id = delivery.user_id
          SET delivery.state = 'pending', delivery.attempts = 0, delivery.next_attempt_at = NOW(3)
        WHERE assembly.build_id = ? AND fit_check.workshop_id = ? AND delivery.state = 'failed' AND preference.paused_at IS NULL`,
      [buildId, workshopId],
    );
    return this.forBuild(workshopId, buildId);
  }

  private async buildOf(workshopId: string, buildId: string): Promise<void> {
    const found = (await this.dataSource.query('SELECT id FROM builds WHERE id = ? AND workshop_id = ?', [buildId, workshopId])) as unknown[];
    if (!found.length) throw new NotFoundException({ message: 'Build not found', code: 'build_not_found', errors: { buildId: 'No such build in this workshop' } });
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
