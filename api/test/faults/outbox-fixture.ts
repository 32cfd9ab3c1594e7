import { randomBytes, randomUUID } from 'node:crypto';
import { existsSync, readFileSync, rmSync } from 'node:fs';
import { join } from 'node:path';
import { hashPassword } from '../../src/auth/password-hasher';
import type { Agent } from '../support/accounts';
import { portAnswers } from '../support/ports';
import { browserAgentFor, type FaultMariaDb, faultsEnv, Service, waitUntil } from './fault-harness';

/** One message as the recording SMTP fake accepted it. */
export interface RecordedMail {
  to: string[];
  subject: string;
  messageId: string;
  listUnsubscribe: string;
  at: number;
}

/**
 * The outbox fault tests' SMTP server (recording-smtp-fake.js): each accepted message is on disk before
 * the 250 answer, so the tests count exactly what the relay was told was accepted, across restarts.
 */
export class RecordingSmtpFake {
  /** Apart from every profile's ports (test slots use 1055–1064). */
  readonly port = faultsEnv.mailSmtpPort + 100;
  readonly file = join(faultsEnv.data, 'recorded-mail.jsonl');
  private readonly service: Service;

  constructor(delayMs: number) {
    this.service = new Service('recording-smtp', 'node', [join(__dirname, 'recording-smtp-fake.js')], {
      env: { ...process.env, RECORDING_SMTP_PORT: String(this.port), RECORDING_SMTP_FILE: this.file, RECORDING_SMTP_DELAY_MS: String(delayMs) },
    });
  }

  /** What the API and workers need to send here. */
  get appEnv(): NodeJS.ProcessEnv {
    return { SMTP_PORT: String(this.port), SMTP_IGNORE_TLS: 'true' };
  }

  async start({ fresh }: { fresh: boolean }): Promise<void> {
    if (fresh) rmSync(this.file, { force: true });
    if (await portAnswers(this.port)) throw new Error(`port ${this.port} is taken: is another fault run going on?`);
    this.service.spawn();
    await waitUntil('the recording SMTP fake to listen', () => portAnswers(this.port), 20_000);
  }

  /** A clean stop: open connections are cut, so messages in the middle of being sent are not accepted. */
  async stop(): Promise<void> {
    await this.service.stop();
  }

  recorded(): RecordedMail[] {
    if (!existsSync(this.file)) return [];
    return readFileSync(this.file, 'utf8')
      .split('\n')
      .filter((line) => line.length > 0)
      .map((line) => JSON.parse(line) as RecordedMail);
  }
}

/** How one change reached its followers: copies per follower as accepted, and distinct Message-IDs per follower. */
export interface FanOutCount {
  /** Followers with no copy. */
  lost: string[];
  /** Followers with more than one accepted copy (before dropping repeats by Message-ID). */
  repeated: string[];
  /** Followers whose copies carry different Message-IDs: two different mails, which nothing downstream can merge. */
  doubled: string[];
  delivered: number;
}

/** Copies the server accepted per follower, for the followers with more than one. */
export function copiesOf(recorded: RecordedMail[], subject: string, followers: string[]): Map<string, number> {
  const wanted = new Set(followers);
  const copies = new Map<string, number>();
  for (const mail of recorded) {
    if (mail.subject !== subject) continue;
    for (const to of mail.to) if (wanted.has(to)) copies.set(to, (copies.get(to) ?? 0) + 1);
  }
  return new Map([...copies].filter(([, count]) => count > 1));
}

export function countFanOut(recorded: RecordedMail[], subject: string, followers: string[]): FanOutCount {
  const copies = new Map<string, RecordedMail[]>();
  for (const mail of recorded) {
    if (mail.subject !== subject) continue;
    for (const to of mail.to) copies.set(to, [...(copies.get(to) ?? []), mail]);
  }
  return {
    lost: followers.filter((follower) => !copies.has(follower)),
    repeated: followers.filter((follower) => (copies.get(follower)?.length ?? 0) > 1),
    doubled: followers.filter((follower) => new Set((copies.get(follower) ?? []).map((mail) => mail.messageId)).size > 1),
    delivered: followers.filter((follower) => copies.has(follower)).length,
  };
}

/**
 * A workshop with a published guide on one assembly, its owner signed in, and `followers` people
 * following the assembly (inserted straight into the database: verified addresses, never signed in).
 */
export class FanOutFixture {
  owner!: Agent;
  base = '';
  assemblyId = '';
  followers: string[] = [];

  constructor(private readonly mariadb: FaultMariaDb) {}

  async setUp(followerCount: number): Promise<void> {
    const batch = randomBytes(4).toString('hex');
    const ownerEmail = `outbox-owner-${batch}@fitwright.test`;
    const password = 'correct horse battery staple';
    const hash = await hashPassword(password);
    // The owner is made verified in the database: these tests are about the relay, not sign-up mail.
    this.mariadb.sql(
      `INSERT INTO users (id, email, password_hash, display_name, email_verified_at) VALUES ('${randomUUID()}', '${ownerEmail}', '${hash}', 'Outbox Owner', NOW(3))`,
    );
    this.owner = await browserAgentFor();
    await this.owner.post('/api/auth/login').send({ email: ownerEmail, password }).expect(200);
    const workshopId = (await this.owner.post('/api/workshops').send({ name: 'Outbox Shop', slug: `outbox-${batch}` }).expect(201)).body.id as string;
    this.base = `/api/workshops/${workshopId}`;
    const buildId = (await this.owner.post(`${this.base}/builds`).send({ title: 'Fan-out build' }).expect(201)).body.id as string;
    this.assemblyId = (await this.owner.post(`${this.base}/builds/${buildId}/assemblies`).send({ name: 'Fan-out stack' }).expect(201)).body.id as string;
    const guideId = (await this.owner.post(`${this.base}/builds/${buildId}/guides`).send({ title: 'Fan-out guide', assemblyId: this.assemblyId }).expect(201)).body
      .id as string;
    await this.owner.post(`${this.base}/guides/${guideId}/steps`).send({ title: 'Fit it' }).expect(201);
    await this.owner.post(`${this.base}/guides/${guideId}/revisions`).send({}).expect(201);

    this.followers = Array.from({ length: followerCount }, (_, index) => `follower-${index}-${batch}@fitwright.test`);
    const users = this.followers.map((email) => ({ id: randomUUID(), email }));
    this.mariadb.sql(
      `INSERT INTO users (id, email, password_hash, display_name, email_verified_at) VALUES ${users
        .map((user) => `('${user.id}', '${user.email}', 'not-a-password', 'Follower', NOW(3))`)
        .join(', ')};
       INSERT INTO follows (id, user_id, workshop_id, target_kind, target_id) VALUES ${users
         .map((user) => `('${randomUUID()}', '${user.id}', '${workshopId}', 'assembly', '${this.assemblyId}')`)
         .join(', ')};`,
    );
  }

  /** Adds a check and marks it no fit: one change, news to every follower. Returns the mail's subject. */
  async changeCheck(title: string): Promise<string> {
    const checkId = (await this.owner.post(`${this.base}/assemblies/${this.assemblyId}/checks`).send({ title }).expect(201)).body.id as string;
    await this.owner.post(`${this.base}/checks/${checkId}/transitions`).send({ to: 'no_fit', reason: 'Fault test', from: 'open' }).expect(201);
    return `No fit: ${title}`;
  }

  /**
   * The change's deliveries the relay claimed again after an unfinished attempt (started, answer never
   * recorded): the only ones that may reach the server twice. Recipient → how many such re-claims.
   */
  uncertain(subject: string): Map<string, number> {
    const rows = this.mariadb.sql(
      `SELECT recipient, uncertain_attempts FROM mail_deliveries WHERE kind = 'fit-news' AND subject = '${subject.replace(/'/g, "''")}' AND uncertain_attempts > 0`,
    );
    return new Map(rows.filter((row) => row.length === 2).map(([recipient, count]) => [recipient.toLowerCase(), Number(count)]));
  }

  /** How many deliveries of the change each relay process recorded as sent (process id → count). */
  sentBy(subject: string): Map<string, number> {
    const rows = this.mariadb.sql(
      `SELECT sent_by, COUNT(*) FROM mail_deliveries WHERE kind = 'fit-news' AND subject = '${subject.replace(/'/g, "''")}' AND state = 'sent' GROUP BY sent_by`,
    );
    return new Map(rows.filter((row) => row.length === 2).map(([owner, count]) => [owner, Number(count)]));
  }

  /** Deliveries the outbox still has to send (or gave up on). */
  unsent(): { pending: number; failed: number } {
    const [[pending, failed]] = this.mariadb.sql(
      "SELECT SUM(state = 'pending'), SUM(state = 'failed') FROM mail_deliveries WHERE kind = 'fit-news'",
    );
    return { pending: Number(pending === 'NULL' ? 0 : pending), failed: Number(failed === 'NULL' ? 0 : failed) };
  }
}
