import { NestExpressApplication } from '@nestjs/platform-express';
import { DataSource } from 'typeorm';
import { DEMO_PASSWORD, DEMO_PEOPLE, DEMO_WORKSHOP, demoSignInLines, loadDemoAccounts } from '../src/database/demo/demo-accounts';
import { createTestApp } from './create-test-app';
import { signIn } from './support/accounts';

jest.setTimeout(30_000);

describe('demo accounts (real MariaDB)', () => {
  let app: NestExpressApplication;
  beforeAll(async () => {
    app = await createTestApp();
  });
  afterAll(async () => app.close());

  it('loads the demo people and workshop once, however often it runs', async () => {
    const first = await loadDemoAccounts(app.get(DataSource));
    const second = await loadDemoAccounts(app.get(DataSource));
    expect(second).toEqual(first);
    const [{ count }] = await app.get(DataSource).query('SELECT COUNT(*) AS count FROM workshops WHERE slug = ?', [DEMO_WORKSHOP.slug]);
    expect(Number(count)).toBe(1);
  });

  it('lets each demo person sign in with the documented password, in their documented role', async () => {
    const { workshopId } = await loadDemoAccounts(app.get(DataSource));
    const owner = await signIn(app, DEMO_PEOPLE.owner.email, DEMO_PASSWORD);
    expect((await owner.get(`/api/workshops/${workshopId}`).expect(200)).body).toMatchObject({ name: 'Harrow Lane Garage', role: 'owner' });
    const editor = await signIn(app, DEMO_PEOPLE.editor.email, DEMO_PASSWORD);
    expect((await editor.get(`/api/workshops/${workshopId}`).expect(200)).body.role).toBe('editor');
    const follower = await signIn(app, DEMO_PEOPLE.follower.email, DEMO_PASSWORD);
    await follower.get(`/api/workshops/${workshopId}`).expect(404);
    const admin = await signIn(app, DEMO_PEOPLE.admin.email, DEMO_PASSWORD);
    expect((await admin.get('/api/auth/me')).body.user).toMatchObject({ isAdmin: true, emailVerified: true });
    expect(demoSignInLines().join('\n')).toContain(DEMO_PEOPLE.owner.email);
  });
});
