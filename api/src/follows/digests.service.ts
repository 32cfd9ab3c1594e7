import { Inject, Injectable, Logger, OnModuleInit } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { InjectDataSource } from '@nestjs/typeorm';
import { DataSource, In, IsNull } from 'typeorm';
import { hashSecretToken, newSecretToken } from '../common/secret-token';
import type { AppConfig } from '../config/app-config';
import { lastDigestDue, type DigestCadence } from '../engine/digest-schedule';
import { composeMail } from '../infra/mail/compose-mail';
import { MailClock } from '../outbox/mail-clock';
import { MailOutbox } from '../outbox/mail-outbox.service';
import { MailRelay } from '../outbox/mail-relay.service';
import { User } from '../users/entities/user.entity';
import { DigestItem } from './entities/digest-item.entity';
import { MailLink } from './entities/mail-link.entity';
import { DEFAULT_MAIL_PREFERENCE, MailPreference } from './entities/mail-preference.entity';

/** How often a relaying process looks for digests that fell due. */
const DIGEST_CHECK_MS = 5_000;

const STATE_WORDS: Record<string, string> = { open: 'open', bench_pass: 'bench pass', confirmed: 'confirmed', no_fit: 'no fit', retired: 'retired' };

/** The lines of a digest: changes grouped per guide (guides in the order of their first change), each "before → after". */
export function digestParagraphs(items: Pick<DigestItem, 'guideTitle' | 'guideUrl' | 'checkTitle' | 'stateBefore' | 'stateAfter' | 'occurredAt'>[]): string[] {
  const byGuide = new Map<string, typeof items>();
  for (const item of [...items].sort((a, b) => a.occurredAt.getTime() - b.occurredAt.getTime())) {
    const key = `${item.guideTitle}\n${item.guideUrl}`;
    byGuide.set(key, [...(byGuide.get(key) ?? []), item]);
  }
  return [...byGuide.values()].map((changes) =>
    [
      `${changes[0].guideTitle} (${changes[0].guideUrl})`,
      ...changes.map((change) => `- ${change.checkTitle}: ${STATE_WORDS[change.stateBefore ?? ''] ?? 'new'} → ${STATE_WORDS[change.stateAfter] ?? change.stateAfter}`),
    ].join('\n'),
  );
}

/**
 * Daily and weekly digests. The fan-out puts a change for a digest follow in `digest_items`; here, on
 * the relay's round, each person's waiting items whose digest fell due (their local hour, their zone)
 * become one mail in the outbox, keyed by person, cadence and due time, and are marked taken in the same
 * transaction (rows locked with SKIP LOCKED, so two processes never write the same digest).
 */
@Injectable()
export class DigestsService implements OnModuleInit {
  private readonly logger = new Logger(DigestsService.name);
  private readonly appOrigin: string;

  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    @Inject(MailOutbox) private readonly outbox: MailOutbox,
    @Inject(MailRelay) private readonly relay: MailRelay,
    @Inject(MailClock) private readonly clock: MailClock,
    @Inject(ConfigService) config: ConfigService<AppConfig, true>,
  ) {
    this.appOrigin = config.get('appOrigin', { infer: true });
  }

  onModuleInit(): void {
    this.relay.registerChore({ name: 'digests', everyMs: DIGEST_CHECK_MS, run: () => this.writeDueDigests().then(() => undefined) });
  }

  /** Returns how many digests were written to the outbox. */
  async writeDueDigests(): Promise<number> {
    const waiting = (await this.dataSource.query('SELECT DISTINCT user_id AS userId, cadence FROM digest_items WHERE digest_key IS NULL')) as {
      userId: string;
      cadence: DigestCadence;
    }[];
    if (!waiting.length) return 0;
    const preferences = await this.dataSource.getRepository(MailPreference).findBy({ userId: In([...new Set(waiting.map((row) => row.userId))]) });
    let written = 0;
    for (const { userId, cadence } of waiting) {
      const preference = preferences.find((row) => row.userId === userId) ?? { ...DEFAULT_MAIL_PREFERENCE, userId };
      const due = lastDigestDue(this.clock.now(), {
        cadence,
        timeZone: preference.timeZone,
        hour: preference.digestHour,
        weekday: preference.digestWeekday,
      });
      if (await this.writeDigest(userId, cadence, due, preference.pausedAt !== null)) written += 1;
    }
    return written;
  }

  private async writeDigest(userId: string, cadence: DigestCadence, due: Date, paused: boolean): Promise<boolean> {
    return this.dataSource.transaction(async (manager) => {
      const items = (await manager.query(
        `SELECT id FROM digest_items WHERE user_id = ? AND cadence = ? AND digest_key IS NULL AND occurred_at <= ?
          ORDER BY occurred_at FOR UPDATE SKIP LOCKED`,
        [userId, cadence, due],
      )) as { id: string }[];
      if (!items.length) return false;
      const key = `digest:${userId}:${cadence}:${due.toISOString()}`;
      const rows = await manager.findBy(DigestItem, { id: In(items.map((item) => item.id)) });
      await manager.update(DigestItem, { id: In(rows.map((row) => row.id)) }, { digestKey: key });
      const user = await manager.findOneBy(User, { id: userId, disabledAt: IsNull() });
      // A paused address or a closed account takes its items off the queue without a mail.
      if (!user || !user.emailVerifiedAt || paused) return false;
      const token = newSecretToken();
      await manager.insert(MailLink, { tokenHash: hashSecretToken(token), userId, purpose: 'digest', cadence });
      const unsubscribe = `${this.appOrigin}/api/follows/unsubscribe?token=${token}`;
      const preferencesUrl = `${this.appOrigin}/mail-preferences?token=${token}`;
      const count = rows.length;
      await this.outbox.send(
        {
          kind: 'digest',
          idempotencyKey: key,
          userId,
          mail: composeMail(
            user.email,
            `Your ${cadence} fit news: ${count} change${count === 1 ? '' : 's'}`,
            [
              `What changed in the verified-fit checklists you follow${cadence === 'daily' ? ' since your last daily digest' : ' this week'}:`,
              ...digestParagraphs(rows),
              `You get this ${cadence} digest because of what you follow. Change when and how: ${preferencesUrl} — or stop the ${cadence} digest: ${this.appOrigin}/unsubscribe?token=${token}`,
            ],
            { label: 'Your mail preferences', url: preferencesUrl },
            { 'List-Unsubscribe': `<${unsubscribe}>`, 'List-Unsubscribe-Post': 'List-Unsubscribe=One-Click' },
          ),
        },
        manager,
      );
      this.logger.log(`${cadence} digest of ${count} change(s) written for user ${userId}`);
      return true;
    });
  }
}
