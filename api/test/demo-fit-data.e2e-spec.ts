import { NestExpressApplication } from '@nestjs/platform-express';
import { DataSource } from 'typeorm';
import { DEMO_PASSWORD, DEMO_PEOPLE, loadDemoAccounts } from '../src/database/demo/demo-accounts';
import { DEMO_BUILD_TITLE, loadDemoFitData } from '../src/database/demo/demo-fit-data';
import { createTestApp } from './create-test-app';
import { signIn } from './support/accounts';

jest.setTimeout(60_000);

interface ChecklistResponse {
  verdict: string;
  checks: { title: string; state: string }[];
}

describe('demo fit data (real MariaDB)', () => {
  let app: NestExpressApplication;
  beforeAll(async () => {
    app = await createTestApp();
  });
  afterAll(async () => app.close());

  it('loads the demo build once and derives its checklist like a creator’s', async () => {
    const accounts = await loadDemoAccounts(app.get(DataSource));
    const ids = { workshopId: accounts.workshopId, creatorId: accounts.ownerId };
    await loadDemoFitData(app, ids);
    await loadDemoFitData(app, ids);

    const owner = await signIn(app, DEMO_PEOPLE.owner.email, DEMO_PASSWORD);
    const base = `/api/workshops/${accounts.workshopId}`;
    const builds = (await owner.get(`${base}/builds`).expect(200)).body as { id: string; title: string }[];
    const demoBuilds = builds.filter((build) => build.title === DEMO_BUILD_TITLE);
    expect(demoBuilds).toHaveLength(1);

    const assemblies = (await owner.get(`${base}/builds/${demoBuilds[0].id}/assemblies`).expect(200)).body as { id: string; name: string }[];
    const checklist = async (name: string) =>
      (await owner.get(`${base}/assemblies/${assemblies.find((assembly) => assembly.name === name)!.id}/checklist`).expect(200))
        .body as ChecklistResponse;

    const stack = await checklist('21-tooth coupler stack');
    const stateOf = (fragment: string) => stack.checks.find((check) => check.title.includes(fragment))?.state;
    expect(stateOf('coupler to gearbox input')).toBe('bench_pass');
    expect(stateOf('pilot bearing on input shaft nose')).toBe('bench_pass');
    // ISO 286-2, 18–30 mm: H7 0/+21 µm and k6 +2/+15 µm make a transition fit; both measured parts are in their classes.
    expect(stateOf('coupler on motor shaft')).toBe('bench_pass');
    expect(stateOf('rear driveshaft')).toBe('bench_pass');
    expect(stateOf('Test-fitted on the vehicle')).toBe('confirmed');
    expect(stateOf('Retention')).toBe('open');
    expect(stack.verdict).toBe('open');

    const rejected = await checklist('27-tooth catalogue coupler');
    expect(rejected).toMatchObject({ verdict: 'no_fit', checks: [{ state: 'no_fit' }] });
  });
});
