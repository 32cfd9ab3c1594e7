import { NestExpressApplication } from '@nestjs/platform-express';
import { DataSource } from 'typeorm';
import { DEMO_PASSWORD, DEMO_PEOPLE, loadDemoAccounts } from '../src/database/demo/demo-accounts';
import { DEMO_BUILD_TITLE, loadDemoFitData } from '../src/database/demo/demo-fit-data';
import { DEMO_CARDS, DEMO_FOOTAGE_TITLE, loadDemoFootage } from '../src/database/demo/demo-footage';
import { createTestApp } from './create-test-app';
import { signIn } from './support/accounts';

// The first run generates the clip with ffmpeg and espeak-ng (about 15 s); later runs reuse it from .data/.
// Loading also waits for the web renditions (about 20 s on an idle 2-core box; far longer under load).
jest.setTimeout(420_000);

describe('demo footage (real MariaDB, Redis, S3 fake, ffmpeg)', () => {
  let app: NestExpressApplication;
  beforeAll(async () => {
    app = await createTestApp();
  });
  afterAll(async () => app.close());

  it('generates, uploads, processes and transcribes the walkthrough once, however often it runs', async () => {
    const accounts = await loadDemoAccounts(app.get(DataSource));
    const ids = { workshopId: accounts.workshopId, creatorId: accounts.ownerId };
    await loadDemoFitData(app, ids);
    await loadDemoFootage(app, ids);
    expect(await loadDemoFootage(app, ids)).toBe('demo footage already loaded');

    const owner = await signIn(app, DEMO_PEOPLE.owner.email, DEMO_PASSWORD);
    const base = `/api/workshops/${accounts.workshopId}`;
    const build = ((await owner.get(`${base}/builds`).expect(200)).body as { id: string; title: string }[]).find(
      (candidate) => candidate.title === DEMO_BUILD_TITLE,
    );
    const footage = (await owner.get(`${base}/builds/${build?.id}/footage`).expect(200)).body.filter(
      (item: { title: string }) => item.title === DEMO_FOOTAGE_TITLE,
    );
    expect(footage).toHaveLength(1);
    expect(footage[0]).toMatchObject({ state: 'ready', width: 960, height: 540, videoCodec: 'h264', transcript: { revision: 1, cueCount: DEMO_CARDS.length } });
    // The same media pipeline as any upload: web renditions at the source's 540 lines and 360 (made at load, or at start for older data).
    let renditions = footage[0].renditions;
    for (const deadline = Date.now() + 120_000; renditions.state !== 'ready' && renditions.state !== 'failed' && Date.now() < deadline; ) {
      await new Promise((done) => setTimeout(done, 500));
      renditions = (await owner.get(`${base}/footage/${footage[0].id}`).expect(200)).body.renditions;
    }
    expect(renditions).toMatchObject({ state: 'ready', variants: [{ width: 960, height: 540 }, { width: 640, height: 360 }] });
    // About 60–90 s of narration (or 6 s a card when espeak-ng is missing).
    expect(footage[0].durationMs).toBeGreaterThan(55_000);
    expect(footage[0].durationMs).toBeLessThan(95_000);

    const found = await owner.get(`${base}/footage/${footage[0].id}/transcript/search?q=thousandths`).expect(200);
    expect(found.body.results.map((cue: { text: string }) => cue.text)).toEqual([expect.stringContaining('fifteen thousandths of an inch of end float')]);
  });
});
