import { getQueueToken } from '@nestjs/bull';
import { NestExpressApplication } from '@nestjs/platform-express';
import type { Queue } from 'bull';
import request from 'supertest';
import { QUEUES } from '../src/infra/jobs/queues';
import { createTestApp } from './create-test-app';

describe('GET /api/health (real MariaDB, Redis, S3 fake, mail fake)', () => {
  let app: NestExpressApplication;
  afterEach(async () => app?.close());

  it('reports every service up when all answer', async () => {
    app = await createTestApp();
    const response = await request(app.getHttpServer()).get('/api/health');
    // The body first: when this fails, it names the check that was down.
    expect(response.body).toEqual({
      status: 'ok',
      checks: { database: 'up', storage: 'up', mail: 'up', queue: 'up' },
    });
    expect(response.status).toBe(200);
  });

  it('answers 503 and names the check that is down when SMTP does not answer', async () => {
    // Port 9 (discard) has no listener here: the mail probe fails while the others still pass.
    app = await createTestApp({ SMTP_PORT: '9' });
    const response = await request(app.getHttpServer()).get('/api/health').expect(503);
    expect(response.body).toMatchObject({
      statusCode: 503,
      message: 'Down: mail',
      status: 'down',
      checks: { database: 'up', storage: 'up', mail: 'down', queue: 'up' },
    });
  });

  it('closes cleanly straight after start-up: every queue worker is running once init() returns', async () => {
    // A worker still connecting when its queue closes rejects a promise nobody awaits; Jest fails on that.
    for (let round = 0; round < 3; round++) {
      app = await createTestApp();
      for (const name of Object.values(QUEUES)) {
        // bclient is the worker's blocking connection (not in Bull's typings).
        const queue = app.get<Queue>(getQueueToken(name), { strict: false }) as Queue & { bclient: { status: string } };
        expect({ name, worker: queue.bclient.status }).toEqual({ name, worker: 'ready' });
      }
      await app.close();
    }
    // Three full start-ups and closes: on a busy 2-core box one start-up alone can take 2–4 s.
  }, 60_000);

  it('reports storage down when the bucket does not exist', async () => {
    app = await createTestApp({ S3_BUCKET: 'no-such-bucket' });
    const response = await request(app.getHttpServer()).get('/api/health').expect(503);
    expect(response.body.checks).toEqual({ database: 'up', storage: 'down', mail: 'up', queue: 'up' });
  });
});

describe('app foundations', () => {
  let app: NestExpressApplication;
  beforeAll(async () => {
    app = await createTestApp();
  });
  afterAll(async () => app.close());

  it('serves the OpenAPI document with the contract routes', async () => {
    const response = await request(app.getHttpServer()).get('/api/docs/openapi.json').expect(200);
    expect(Object.keys(response.body.paths)).toEqual(
      expect.arrayContaining(['/api/health', '/api/tools/fits', '/api/tools/measurements/extract', '/api/tools/transcripts/parse']),
    );
  });

  it('answers an unknown API route with the JSON error shape', async () => {
    const response = await request(app.getHttpServer()).get('/api/no-such-route').expect(404);
    expect(response.body).toMatchObject({ statusCode: 404, message: expect.any(String) });
  });

  it('sets security headers', async () => {
    const response = await request(app.getHttpServer()).get('/api/health');
    expect(response.headers['x-content-type-options']).toBe('nosniff');
    expect(response.headers['content-security-policy']).toContain("default-src 'self'");
    expect(response.headers['x-powered-by']).toBeUndefined();
  });
});
