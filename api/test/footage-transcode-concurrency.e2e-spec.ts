import { NestExpressApplication } from '@nestjs/platform-express';
import { DataSource } from 'typeorm';
import { createTestApp } from './create-test-app';
import { signUpAndSignIn, TestAccount, uniqueSlug } from './support/accounts';
import { makeClip, removeScratch, uploadFile } from './support/footage';

jest.setTimeout(300_000);

/**
 * One process runs at most one transcode at a time (ffmpeg already uses every core). Bull adds up the
 * concurrency of every named handler on a queue and lets any slot take any job, so when transcodes
 * shared the media queue with probing (2 + 1 slots) three uploads in a row were transcoded at once.
 * Here three uploads go in back to back and the footage rows are watched while the single app works
 * the queues: never more than one in `processing`, and all three end `ready`.
 */
describe('footage transcodes: one at a time per process', () => {
  let app: NestExpressApplication;
  let db: DataSource;
  let owner: TestAccount;
  let workshopId: string;
  let buildId: string;

  beforeAll(async () => {
    app = await createTestApp();
    db = app.get(DataSource);
    owner = await signUpAndSignIn(app, { displayName: 'Noor Castell' });
    const workshop = await owner.agent.post('/api/workshops').send({ name: 'Ferncliff Fabrication', slug: uniqueSlug('one-transcode') }).expect(201);
    workshopId = workshop.body.id;
    const build = await owner.agent.post(`/api/workshops/${workshopId}/builds`).send({ title: 'Pulley bore check' }).expect(201);
    buildId = build.body.id;
  });
  afterAll(async () => {
    removeScratch();
    await app.close();
  });

  async function renditionStates(): Promise<string[]> {
    const rows: { state: string }[] = await db.query('SELECT renditions_state AS state FROM footage WHERE workshop_id = ?', [workshopId]);
    return rows.map((row) => row.state);
  }

  it('never runs two transcodes at once in one process, and finishes every one', async () => {
    // Long enough (a few seconds of ffmpeg each on a shared box) that uploads overlap their transcodes.
    const clips = [0, 1, 2].map((index) => makeClip(`one-at-a-time-${index}.mp4`, { seconds: 8, width: 640, height: 360 }));
    let mostAtOnce = 0;
    let watching = true;
    const watcher = (async () => {
      while (watching) {
        const processing = (await renditionStates()).filter((state) => state === 'processing').length;
        mostAtOnce = Math.max(mostAtOnce, processing);
        await new Promise((resolve) => setTimeout(resolve, 40));
      }
    })();
    try {
      for (const clip of clips) await uploadFile(owner.agent, workshopId, buildId, clip);
      const deadline = Date.now() + 240_000;
      for (;;) {
        const states = await renditionStates();
        if (states.length === 3 && states.every((state) => state === 'ready' || state === 'failed')) break;
        if (Date.now() > deadline) throw new Error(`renditions still ${states.join(', ')}`);
        await new Promise((resolve) => setTimeout(resolve, 250));
      }
    } finally {
      watching = false;
      await watcher;
    }
    expect(await renditionStates()).toEqual(['ready', 'ready', 'ready']);
    // At least one was seen running (the watcher works), and never two.
    expect(mostAtOnce).toBe(1);
  });
});
