import { NestExpressApplication } from '@nestjs/platform-express';
import request from 'supertest';
import { DataSource } from 'typeorm';
import { loadDemoAccounts } from '../src/database/demo/demo-accounts';
import { loadDemoFitData } from '../src/database/demo/demo-fit-data';
import { loadDemoFootage } from '../src/database/demo/demo-footage';
import { DEMO_PASSWORD, DEMO_PEOPLE } from '../src/database/demo/demo-accounts';
import { DEMO_GUIDE_TITLE, loadDemoFollower, loadDemoGuide } from '../src/database/demo/demo-guide';
import { loadDemoMarks } from '../src/database/demo/demo-marks';
import { createTestApp } from './create-test-app';
import { signIn } from './support/accounts';

// The demo clip may have to be generated first (about 15 s); later runs reuse it from .data/.
jest.setTimeout(180_000);

describe('demo guide (real MariaDB, Redis, S3 fake)', () => {
  let app: NestExpressApplication;
  beforeAll(async () => {
    app = await createTestApp();
  });
  afterAll(async () => app.close());

  it('publishes the walkthrough guide once, readable by anyone with its cautions, checklist and marks', async () => {
    const accounts = await loadDemoAccounts(app.get(DataSource));
    const ids = { workshopId: accounts.workshopId, creatorId: accounts.ownerId };
    await loadDemoFitData(app, ids);
    await loadDemoFootage(app, ids);
    await loadDemoMarks(app, ids);
    await loadDemoGuide(app, ids);
    expect(await loadDemoGuide(app, ids)).toBe('demo guide already loaded');
    // Two published revisions with a real difference, for the revisions pages.
    const revisions = (await request(app.getHttpServer()).get('/api/guides/harrow-lane-garage/fitting-the-21-tooth-coupler-stack/revisions').expect(200)).body;
    expect(revisions.currentRevision).toBeGreaterThanOrEqual(2);
    const diff = (await request(app.getHttpServer()).get('/api/guides/harrow-lane-garage/fitting-the-21-tooth-coupler-stack/revisions/compare').query({ from: 1, to: revisions.currentRevision }).expect(200)).body;
    expect(diff.changed.map((step: { title: string }) => step.title)).toContain('Seat the coupler and read its end float');
    await loadDemoFollower(app, { workshopId: accounts.workshopId, followerId: accounts.followerId });
    expect(await loadDemoFollower(app, { workshopId: accounts.workshopId, followerId: accounts.followerId })).toBe('demo follower already loaded');
    const follower = await signIn(app, DEMO_PEOPLE.follower.email, DEMO_PASSWORD);
    expect((await follower.get('/api/follows').expect(200)).body.map((follow: { label: string }) => follow.label)).toEqual(['Motor-to-gearbox coupler']);
    const reports = (await follower.get('/api/fit-reports').expect(200)).body;
    expect(reports.map((report: { outcome: string; status: string }) => [report.outcome, report.status]).sort()).toEqual([
      ['fit', 'investigating'],
      ['no_fit', 'new'],
    ]);
    expect(reports.find((report: { outcome: string }) => report.outcome === 'fit').fitCheck.title).toBe('Retention: coupler set screw and key staked');

    const index = await request(app.getHttpServer()).get('/api/guides').query({ q: 'coupler stack' }).expect(200);
    const entry = index.body.find((item: { title: string; workshop: { name: string } }) => item.title === DEMO_GUIDE_TITLE && item.workshop.name === 'Harrow Lane Garage');
    expect(entry.revision).toBeGreaterThanOrEqual(2);
    expect(entry).toMatchObject({ stepCount: 6, skillLevel: 'seasoned_fitter', estimatedMinutes: 180 });

    const view = await request(app.getHttpServer()).get(`/api${entry.path}`).expect(200);
    expect(view.body.cautions.map((caution: { level: string; topic: string }) => `${caution.level} ${caution.topic}`)).toEqual([
      'DANGER high_voltage',
      'WARNING lifting',
      'WARNING rotating_parts',
    ]);
    expect(view.body.footage).toMatchObject({ videoUrl: `/api${entry.path}/video`, captionsUrl: `/api${entry.path}/captions.vtt` });
    expect(view.body.checklist.assemblyName).toBe('21-tooth coupler stack');
    expect(view.body.guide).toMatchObject({ skillLevel: 'seasoned_fitter', estimatedMinutes: 180 });
    expect(view.body.steps.map((step: { estimatedMinutes: number | null }) => step.estimatedMinutes)).toEqual([30, 10, 20, 25, 35, 30]);
    expect(view.body.parts.length).toBeGreaterThan(1);
    // Steps follow the narration: each starts later than the one before.
    const starts = view.body.steps.map((step: { startMs: number }) => step.startMs);
    expect(starts).toEqual([...starts].sort((a: number, b: number) => a - b));
    expect(view.body.marks.filter((mark: { kind: string }) => mark.kind === 'step').map((mark: { label: string }) => mark.label)).toEqual([
      'Counting the coupler’s 21 teeth',
      'Feeler gauge at the motor face',
    ]);
  });
});
