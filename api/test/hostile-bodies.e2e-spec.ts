import { NestExpressApplication } from '@nestjs/platform-express';
import { DataSource } from 'typeorm';
import { createTestApp } from './create-test-app';
import { signUpAndSignIn, type Agent, type TestAccount } from './support/accounts';
import { removeScratch } from './support/footage';
import { countRows, makeWorkshopFixture, type WorkshopFixture } from './support/workshop-fixture';

jest.setTimeout(180_000);

/**
 * A table of hostile bodies thrown at one write route of every domain: each answers 4xx with the field named
 * (or the body named, when the whole body is wrong) and stores nothing. Bodies go out as raw JSON text, so
 * literals that JavaScript cannot send (1e309, which JSON.parse reads as Infinity) reach the server as typed.
 */
describe('hostile request bodies answer 4xx naming the field and store nothing (real MariaDB, S3 fake)', () => {
  let app: NestExpressApplication;
  let mine: WorkshopFixture;
  let reader: TestAccount;

  beforeAll(async () => {
    app = await createTestApp();
    [mine, reader] = await Promise.all([makeWorkshopFixture(app, 'hostile'), signUpAndSignIn(app)]);
  });
  afterAll(async () => {
    removeScratch();
    await app.close();
  });

  interface Route {
    name: string;
    method: 'post' | 'put' | 'patch';
    path: () => string;
    agent: () => Agent;
    /** A body the route accepts; each hostile body changes one field of it. */
    valid: () => Record<string, unknown>;
    text: string;
    number?: string;
    boolean?: string;
    /** What the route would store, as JSON text: it must read the same after every refusal. */
    rows: () => Promise<unknown>;
  }

  const displayName = async () =>
    (await app.get(DataSource).query<{ display_name: string }[]>('SELECT display_name FROM users WHERE id = ?', [reader.id]))[0].display_name;

  const routes = (): Route[] => [
    {
      name: 'POST /workshops',
      method: 'post',
      path: () => '/api/workshops',
      agent: () => reader.agent,
      valid: () => ({ name: 'Hostile shop', slug: `hostile-${Date.now().toString(36)}` }),
      text: 'name',
      rows: () => countRows(app, 'workshop_members', 'user_id', reader.id),
    },
    {
      name: 'POST builds',
      method: 'post',
      path: () => `${mine.base}/builds`,
      agent: () => mine.owner.agent,
      valid: () => ({ title: 'Hostile build' }),
      text: 'title',
      rows: () => countRows(app, 'builds', 'workshop_id', mine.workshopId),
    },
    {
      name: 'POST parts',
      method: 'post',
      path: () => `${mine.base}/parts`,
      agent: () => mine.owner.agent,
      valid: () => ({ partNumber: 'HB-9', title: 'Spacer', category: 'other', features: [{ name: 'bore', kind: 'diameter', role: 'hole', nominal: '15', unit: 'mm' }] }),
      text: 'title',
      rows: () => countRows(app, 'parts', 'workshop_id', mine.workshopId),
    },
    {
      name: 'POST assemblies',
      method: 'post',
      path: () => `${mine.base}/builds/${mine.buildId}/assemblies`,
      agent: () => mine.owner.agent,
      valid: () => ({ name: 'Hostile stack' }),
      text: 'name',
      rows: () => countRows(app, 'assemblies', 'workshop_id', mine.workshopId),
    },
    {
      name: 'POST fit checks',
      method: 'post',
      path: () => `${mine.base}/assemblies/${mine.assemblyId}/checks`,
      agent: () => mine.owner.agent,
      valid: () => ({ title: 'Hostile check', required: true }),
      text: 'title',
      boolean: 'required',
      rows: () => countRows(app, 'fit_checks', 'workshop_id', mine.workshopId),
    },
    {
      name: 'POST measurements',
      method: 'post',
      path: () => `${mine.base}/measurements`,
      agent: () => mine.owner.agent,
      valid: () => ({ featureId: mine.holeFeatureId, quantity: 'diameter', value: '15.011', unit: 'mm', instrumentKind: 'bore_gauge', resolution: '0.001', temperatureC: 20 }),
      text: 'note',
      number: 'temperatureC',
      rows: () => countRows(app, 'measurements', 'workshop_id', mine.workshopId),
    },
    {
      name: 'POST marks',
      method: 'post',
      path: () => `${mine.base}/footage/${mine.footageId}/marks`,
      agent: () => mine.owner.agent,
      valid: () => ({ kind: 'note', startMs: 500, label: 'hostile' }),
      text: 'label',
      number: 'startMs',
      rows: () => countRows(app, 'marks', 'footage_id', mine.footageId),
    },
    {
      name: 'POST footage',
      method: 'post',
      path: () => `${mine.base}/builds/${mine.buildId}/footage`,
      agent: () => mine.owner.agent,
      valid: () => ({ fileName: 'clip.mp4', contentType: 'video/mp4', sizeBytes: 1000 }),
      text: 'title',
      number: 'sizeBytes',
      rows: () => countRows(app, 'footage', 'workshop_id', mine.workshopId),
    },
    {
      name: 'PUT transcript',
      method: 'put',
      path: () => `${mine.base}/footage/${mine.footageId}/transcript`,
      agent: () => mine.owner.agent,
      valid: () => ({ text: 'WEBVTT\n\n00:00.500 --> 00:01.500\nHostile cue\n' }),
      text: 'text',
      rows: () => countRows(app, 'transcripts', 'footage_id', mine.footageId),
    },
    {
      name: 'POST guide steps',
      method: 'post',
      path: () => `${mine.base}/guides/${mine.guideId}/steps`,
      agent: () => mine.owner.agent,
      valid: () => ({ title: 'Hostile step', footageId: mine.footageId, startMs: 100 }),
      text: 'title',
      number: 'startMs',
      rows: () => countRows(app, 'guide_steps', 'guide_id', mine.guideId),
    },
    {
      name: 'POST fit reports',
      method: 'post',
      path: () => `/api/guides/${mine.workshopSlug}/${mine.guideSlug}/fit-reports`,
      agent: () => reader.agent,
      valid: () => ({ outcome: 'fit', parts: 'the hostile pair' }),
      text: 'parts',
      rows: () => countRows(app, 'fit_reports', 'workshop_id', mine.workshopId),
    },
    {
      name: 'POST invitations',
      method: 'post',
      path: () => `${mine.base}/invitations`,
      agent: () => mine.owner.agent,
      valid: () => ({ email: 'hostile-invitee@fitwright.test', role: 'editor' }),
      text: 'email',
      rows: () => countRows(app, 'invitations', 'workshop_id', mine.workshopId),
    },
    {
      name: 'POST follows',
      method: 'post',
      path: () => '/api/follows',
      agent: () => reader.agent,
      valid: () => ({ targetKind: 'workshop', targetId: mine.workshopId }),
      text: 'targetKind',
      rows: () => countRows(app, 'follows', 'user_id', reader.id),
    },
    {
      name: 'PATCH /users/me',
      method: 'patch',
      path: () => '/api/users/me',
      agent: () => reader.agent,
      valid: () => ({ displayName: 'Hostile Reader' }),
      text: 'displayName',
      rows: displayName,
    },
  ];

  /** Replaces `field`'s value with raw JSON text (so 1e309 goes out as written). */
  const withRaw = (valid: Record<string, unknown>, field: string, rawJson: string): string =>
    JSON.stringify({ ...valid, [field]: '__RAW__' }).replace('"__RAW__"', rawJson);

  interface Hostile {
    label: string;
    body: (route: Route) => string | undefined;
    status: number;
    /** What the answer must name: a field of the route, or a word about the whole body. */
    names: (route: Route) => string;
  }

  const deep = (levels: number) => '['.repeat(levels) + ']'.repeat(levels);
  const hostiles: Hostile[] = [
    { label: 'not JSON', body: () => '{"title": ', status: 400, names: () => 'JSON' },
    { label: 'an array for the body', body: (route) => JSON.stringify([route.valid()]), status: 400, names: () => 'body' },
    // body-parser's strict mode already refuses a top-level scalar as invalid JSON.
    { label: 'a number for the body', body: () => '42', status: 400, names: () => 'JSON' },
    { label: 'nested 10,000 deep', body: (route) => withRaw(route.valid(), route.text, deep(10_000)), status: 400, names: () => 'deeper' },
    { label: 'over the size limit (6 MB)', body: (route) => withRaw(route.valid(), route.text, JSON.stringify('x'.repeat(6 * 1024 * 1024))), status: 413, names: () => 'larger' },
    { label: 'NUL in text', body: (route) => withRaw(route.valid(), route.text, '"Coupler\\u0000 A"'), status: 400, names: (route) => route.text },
    { label: 'ESC in text', body: (route) => withRaw(route.valid(), route.text, '"\\u001b[31mred"'), status: 400, names: (route) => route.text },
    { label: 'an array for text', body: (route) => withRaw(route.valid(), route.text, '["a","b"]'), status: 400, names: (route) => route.text },
    { label: 'an object for text', body: (route) => withRaw(route.valid(), route.text, '{"$gt":""}'), status: 400, names: (route) => route.text },
    { label: 'a number for text', body: (route) => withRaw(route.valid(), route.text, '1e308'), status: 400, names: (route) => route.text },
    { label: '1e308 for a number', body: (route) => route.number && withRaw(route.valid(), route.number, '1e308'), status: 400, names: (route) => route.number! },
    { label: '1e309 (Infinity) for a number', body: (route) => route.number && withRaw(route.valid(), route.number, '-1e309'), status: 400, names: (route) => route.number! },
    { label: 'a string for a number', body: (route) => route.number && withRaw(route.valid(), route.number, '"12"'), status: 400, names: (route) => route.number! },
    { label: 'true for a number', body: (route) => route.number && withRaw(route.valid(), route.number, 'true'), status: 400, names: (route) => route.number! },
    { label: 'an array for a number', body: (route) => route.number && withRaw(route.valid(), route.number, '[1]'), status: 400, names: (route) => route.number! },
    { label: 'an object for a number', body: (route) => route.number && withRaw(route.valid(), route.number, '{"n":1}'), status: 400, names: (route) => route.number! },
    { label: '1 for a boolean', body: (route) => route.boolean && withRaw(route.valid(), route.boolean, '1'), status: 400, names: (route) => route.boolean! },
    { label: '"true" for a boolean', body: (route) => route.boolean && withRaw(route.valid(), route.boolean, '"true"'), status: 400, names: (route) => route.boolean! },
  ];

  it('refuses every hostile body on every route, naming what was wrong, with no row added or changed', async () => {
    const failures: string[] = [];
    let sent = 0;
    for (const route of routes()) {
      for (const hostile of hostiles) {
        const body = hostile.body(route);
        if (body === undefined) continue;
        const before = JSON.stringify(await route.rows());
        const response = await route.agent()[route.method](route.path()).set('Content-Type', 'application/json').send(body);
        sent++;
        const after = JSON.stringify(await route.rows());
        const answer = JSON.stringify(response.body);
        const named = hostile.names(route);
        if (response.status !== hostile.status || !answer.includes(named) || before !== after) {
          failures.push(`${route.name}, ${hostile.label}: ${response.status} (wanted ${hostile.status} naming ${named}) ${answer.slice(0, 300)}${before !== after ? ' ROWS CHANGED' : ''}`);
        }
      }
    }
    expect(failures).toEqual([]);
    expect(sent).toBeGreaterThan(150);
  });

  it('still accepts each route’s valid body, so the refusals above are about the hostile field', async () => {
    for (const route of routes()) {
      const before = JSON.stringify(await route.rows());
      const response = await route.agent()[route.method](route.path()).send(route.valid());
      expect({ route: route.name, status: response.status < 300 }).toEqual({ route: route.name, status: true });
      expect(JSON.stringify(await route.rows())).not.toBe(before);
    }
  });

  it('keeps tab, line feed and carriage return in text, which the control-character rule allows', async () => {
    const note = 'first line\r\n\tsecond line';
    const created = await mine.owner.agent
      .post(`${mine.base}/measurements`)
      .send({ featureId: mine.holeFeatureId, quantity: 'diameter', value: '15.010', unit: 'mm', instrumentKind: 'bore_gauge', resolution: '0.001', note })
      .expect(201);
    expect(created.body.note).toBe(note);
  });

  it('refuses a control character in a query string, naming the parameter', async () => {
    const response = await mine.owner.agent.get(`${mine.base}/parts`).query({ q: 'bore\u0000' });
    expect(response.status).toBe(400);
    expect(JSON.stringify(response.body)).toMatch(/\bq contains a control character/);
  });

  it('turns only decimal text into query numbers: empty, true and 1e999 are refused, naming the parameter', async () => {
    for (const size of ['', 'true', '1e999', '25abc']) {
      const response = await mine.owner.agent.get('/api/tools/fits').query({ size, unit: 'mm', hole: 'H7', shaft: 'g6' });
      expect({ size, status: response.status, names: JSON.stringify(response.body).includes('size') }).toEqual({ size, status: 400, names: true });
    }
    await mine.owner.agent.get('/api/tools/fits').query({ size: '25', unit: 'mm', hole: 'H7', shaft: 'g6' }).expect(200);
  });
});
