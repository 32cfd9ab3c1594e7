import { NestExpressApplication } from '@nestjs/platform-express';
import { DataSource } from 'typeorm';
import { createTestApp } from './create-test-app';
import { browserAgent, signIn, signUpAndSignIn, TestAccount } from './support/accounts';

jest.setTimeout(30_000);

describe('site administration (real MariaDB)', () => {
  let app: NestExpressApplication;
  let admin: TestAccount;
  let member: TestAccount;
  let workshopId: string;
  const slug = `admin-case-${Date.now().toString(36)}`;

  beforeAll(async () => {
    app = await createTestApp();
    admin = await signUpAndSignIn(app, { displayName: 'Morgan Hale' });
    await app.get(DataSource).query('UPDATE users SET is_admin = 1 WHERE id = ?', [admin.id]);
    member = await signUpAndSignIn(app, { displayName: `Quill Searchable ${Date.now().toString(36)}` });
    workshopId = (await member.agent.post('/api/workshops').send({ name: 'Brackwater Fabrication', slug }).expect(201)).body.id;
  });
  afterAll(async () => app.close());

  it('lists and searches users by name or e-mail address, a page at a time', async () => {
    const byName = await admin.agent.get('/api/admin/users').query({ search: member.displayName.toUpperCase() }).expect(200);
    expect(byName.body).toMatchObject({ total: 1, page: 1, pageSize: 50 });
    expect(byName.body.items[0]).toMatchObject({ id: member.id, email: member.email, disabled: false, isAdmin: false });
    const byEmail = await admin.agent.get('/api/admin/users').query({ search: member.email }).expect(200);
    expect(byEmail.body.items.map((user: { id: string }) => user.id)).toEqual([member.id]);
    // LIKE wildcards are taken literally.
    expect((await admin.agent.get('/api/admin/users').query({ search: '%' }).expect(200)).body.total).toBe(0);
    await admin.agent.get('/api/admin/users').query({ page: 0 }).expect(400);
  });

  it('lists and searches workshops with their owners and member count', async () => {
    const found = await admin.agent.get('/api/admin/workshops').query({ search: slug }).expect(200);
    expect(found.body.items).toEqual([
      expect.objectContaining({ id: workshopId, name: 'Brackwater Fabrication', memberCount: 1, disabled: false, owners: [`${member.displayName} <${member.email}>`] }),
    ]);
  });

  it('disables a user: their sessions end and they cannot sign in until enabled again', async () => {
    const target = await signUpAndSignIn(app);
    await admin.agent.post(`/api/admin/users/${target.id}/disable`).expect(204);
    expect((await target.agent.get('/api/auth/me')).body.user).toBeNull();
    await (await browserAgent(app)).post('/api/auth/login').send({ email: target.email, password: target.password }).expect(403);
    expect((await admin.agent.get('/api/admin/users').query({ search: target.email })).body.items[0].disabled).toBe(true);
    await admin.agent.post(`/api/admin/users/${target.id}/enable`).expect(204);
    await signIn(app, target.email, target.password);
  });

  it('does not let an admin disable themself, and answers 404 for an unknown user', async () => {
    await admin.agent.post(`/api/admin/users/${admin.id}/disable`).expect(409);
    await admin.agent.post('/api/admin/users/00000000-0000-4000-8000-000000000000/disable').expect(404);
    await admin.agent.post('/api/admin/users/nope/disable').expect(404);
  });

  it('disables a workshop (read-only for its members) and enables it again', async () => {
    await admin.agent.post(`/api/admin/workshops/${workshopId}/disable`).expect(204);
    expect((await member.agent.get(`/api/workshops/${workshopId}`).expect(200)).body.disabled).toBe(true);
    await member.agent.patch(`/api/workshops/${workshopId}`).send({ name: 'Renamed' }).expect(403);
    await admin.agent.post(`/api/admin/workshops/${workshopId}/enable`).expect(204);
    await member.agent.patch(`/api/workshops/${workshopId}`).send({ name: 'Renamed' }).expect(200);
  });

  it('is closed to everyone but site admins', async () => {
    const refused = await member.agent.get('/api/admin/users').expect(403);
    expect(refused.body.message).toBe('Only site administrators may do this.');
    await member.agent.post(`/api/admin/workshops/${workshopId}/disable`).expect(403);
    await (await browserAgent(app)).get('/api/admin/workshops').expect(401);
  });
});
