import { NestExpressApplication } from '@nestjs/platform-express';
import request from 'supertest';
import { createTestApp } from './create-test-app';

describe('public calculators (contract in DESIGN.md)', () => {
  let app: NestExpressApplication;
  beforeAll(async () => {
    app = await createTestApp();
  });
  afterAll(async () => app.close());

  describe('GET /api/tools/fits', () => {
    it('answers the documented example exactly', async () => {
      // ISO 286-2, 18–30 mm: H7 = +21/0 µm, g6 = −7/−20 µm.
      const response = await request(app.getHttpServer()).get('/api/tools/fits?size=25&unit=mm&hole=H7&shaft=g6').expect(200);
      expect(response.body).toEqual({
        hole: { upper: 21, lower: 0 },
        shaft: { upper: -7, lower: -20 },
        clearance: { max: 41, min: 7 },
        kind: 'clearance',
        convention: { jsRounding: 'none', description: 'js/JS = ±IT/2 exactly, as in the current ISO 286-2 tables' },
      });
    });

    it('gives js/JS as ±IT/2 by default and rounds odd IT7 to even only when asked, saying which', async () => {
      // ISO 286-2, 18–30 mm: IT7 = 21 µm, so JS7 = ±10.5 µm; the older rounding gives ±10 µm. h6 = 0/−13 µm.
      const server = app.getHttpServer();
      const current = await request(server).get('/api/tools/fits?size=25&unit=mm&hole=JS7&shaft=h6').expect(200);
      expect(current.body).toMatchObject({ hole: { upper: 10.5, lower: -10.5 }, convention: { jsRounding: 'none' } });
      const older = await request(server).get('/api/tools/fits?size=25&unit=mm&hole=JS7&shaft=h6&jsRounding=even').expect(200);
      expect(older.body).toMatchObject({ hole: { upper: 10, lower: -10 }, clearance: { max: 23, min: -10 }, convention: { jsRounding: 'even' } });
      const bad = await request(server).get('/api/tools/fits?size=25&unit=mm&hole=JS7&shaft=h6&jsRounding=odd').expect(400);
      expect(JSON.stringify(bad.body.message)).toMatch(/jsRounding must be none or even/);
    });

    it('takes a size in inches (1 in = 25.4 mm, in the 18–30 mm range)', async () => {
      const response = await request(app.getHttpServer()).get('/api/tools/fits?size=1&unit=in&hole=H7&shaft=g6').expect(200);
      expect(response.body.clearance).toEqual({ max: 41, min: 7 });
    });

    it('refuses an unknown class with a clear 400', async () => {
      const response = await request(app.getHttpServer()).get('/api/tools/fits?size=25&unit=mm&hole=Q7&shaft=g6').expect(400);
      expect(response.body).toMatchObject({ statusCode: 400, message: expect.stringMatching(/Q7/) });
    });

    it('refuses a size outside the tables', async () => {
      const response = await request(app.getHttpServer()).get('/api/tools/fits?size=600&unit=mm&hole=H7&shaft=g6').expect(400);
      expect(response.body.message).toBe('size must be greater than 0 mm and at most 500 mm (the ISO 286 tables); got 600 mm');
    });

    it('names the field and the rule for a size that is not positive and a class the tables lack', async () => {
      const zero = await request(app.getHttpServer()).get('/api/tools/fits?size=0&unit=mm&hole=H7&shaft=g6').expect(400);
      expect(zero.body.message).toEqual(['size must be greater than 0 mm and at most 500 mm']);
      const early = await request(app.getHttpServer()).get('/api/tools/fits?size=20&unit=mm&hole=H7&shaft=t6').expect(400);
      expect(early.body.message).toMatch(/^shaft: t6 is not defined at 20 mm/);
    });

    it('names each malformed field', async () => {
      const response = await request(app.getHttpServer()).get('/api/tools/fits?size=abc&hole=h7&shaft=G6').expect(400);
      expect(response.body.message).toEqual(
        expect.arrayContaining([
          'size must be a number',
          'hole must be a hole tolerance class such as H7',
          'shaft must be a shaft tolerance class such as g6',
        ]),
      );
    });
  });

  describe('POST /api/tools/measurements/extract', () => {
    it('finds spoken measurements with offsets into the text', async () => {
      const text = 'The bore came in at fifteen thousandths of an inch over, and the pilot is twenty-two millimetres.';
      const response = await request(app.getHttpServer()).post('/api/tools/measurements/extract').send({ text }).expect(200);
      const found = response.body.measurements as { phrase: string; start: number; end: number; unit: string; value: number; millimetres: number }[];
      expect(found).toHaveLength(2);
      for (const hit of found) expect(text.slice(hit.start, hit.end)).toBe(hit.phrase);
      expect(found[0]).toMatchObject({ unit: 'in', value: 0.015, millimetres: 0.381 });
      expect(found[1]).toMatchObject({ unit: 'mm', value: 22, millimetres: 22 });
    });

    it('reads a reading said in two parts as one measurement, and says nothing was left out', async () => {
      const text = 'Okay, the stub is two inches and fifteen thousandths.';
      const response = await request(app.getHttpServer()).post('/api/tools/measurements/extract').send({ text }).expect(200);
      expect(response.body).toEqual({
        measurements: [
          { phrase: 'two inches and fifteen thousandths', start: 18, end: 52, value: 2.015, unit: 'in', millimetres: 51.181 },
        ],
        total: 1,
        truncated: false,
      });
    });

    it('returns at most 1,000 measurements, with the total and truncated: true', async () => {
      const text = Array.from({ length: 1_200 }, (_, index) => `${index + 1} mm`).join(', ');
      const response = await request(app.getHttpServer()).post('/api/tools/measurements/extract').send({ text }).expect(200);
      expect(response.body.measurements).toHaveLength(1_000);
      expect(response.body).toMatchObject({ total: 1_200, truncated: true });
      expect(response.body.measurements[999]).toMatchObject({ phrase: '1000 mm', value: 1000 });
    });

    it('refuses text over 200,000 characters with a 400 naming the field and the cap', async () => {
      const text = 'a'.repeat(200_001);
      const response = await request(app.getHttpServer()).post('/api/tools/measurements/extract').send({ text }).expect(400);
      expect(response.body.message).toEqual([expect.stringMatching(/^text is longer than 200,000 characters/)]);
      await request(app.getHttpServer()).post('/api/tools/measurements/extract').send({ text: text.slice(1) }).expect(200);
    });

    it('refuses a body without text', async () => {
      await request(app.getHttpServer()).post('/api/tools/measurements/extract').send({ words: 'x' }).expect(400);
    });
  });

  describe('POST /api/tools/transcripts/parse', () => {
    it('detects WebVTT and returns cues in milliseconds', async () => {
      const text = 'WEBVTT\n\n00:00:01.000 --> 00:00:04.500\nLift the gearbox onto the jack.\n\n00:05.000 --> 00:09.000\nCheck the spline.\n';
      const response = await request(app.getHttpServer()).post('/api/tools/transcripts/parse').send({ text, format: 'auto' }).expect(200);
      expect(response.body).toEqual({
        format: 'webvtt',
        cues: [
          { startMs: 1000, endMs: 4500, text: 'Lift the gearbox onto the jack.' },
          { startMs: 5000, endMs: 9000, text: 'Check the spline.' },
        ],
        total: 2,
        truncated: false,
      });
    });

    it('answers 422 naming the first bad line', async () => {
      const text = 'WEBVTT\n\n00:00:01.000 --> 00:00:04.000\nfine\n\n00:00:05 -> 9\nbroken\n';
      const response = await request(app.getHttpServer()).post('/api/tools/transcripts/parse').send({ text, format: 'webvtt' }).expect(422);
      expect(response.body).toMatchObject({ statusCode: 422, line: 6, message: expect.stringMatching(/^Line 6: /) });
    });
  });

  it('documents the text tools\' answers, caps and rate limit in OpenAPI', async () => {
    const response = await request(app.getHttpServer()).get('/api/docs/openapi.json').expect(200);
    const document = response.body as {
      paths: Record<string, { post: { responses: Record<string, { content?: { 'application/json': { schema: { $ref: string } } } }> } }>;
      components: { schemas: Record<string, { properties: Record<string, unknown>; required?: string[] }> };
    };
    for (const [path, schemaName] of [
      ['/api/tools/measurements/extract', 'ExtractedMeasurementsDto'],
      ['/api/tools/transcripts/parse', 'ParsedTranscriptDto'],
    ]) {
      const { responses } = document.paths[path].post;
      expect(Object.keys(responses)).toEqual(expect.arrayContaining(['200', '400', '429']));
      expect(responses['200'].content?.['application/json'].schema.$ref).toBe(`#/components/schemas/${schemaName}`);
      expect(document.components.schemas[schemaName].required).toEqual(expect.arrayContaining(['total', 'truncated']));
    }
  });

  describe('rate limits per client address', () => {
    /** Its own Redis prefix, so the low limits and their blocks never touch other tests' counters. */
    const limitedEnv = (limits: Record<string, string>) => ({ ...limits, QUEUE_PREFIX: `fitwright-test-tools-limit-${process.pid}-${Date.now()}` });

    it('answers 429 with a readable message once the text tools budget is spent; other calculators still answer', async () => {
      const limitedApp = await createTestApp(limitedEnv({ TOOLS_TEXT_RATE_LIMIT: '3', TOOLS_RATE_LIMIT: '100' }));
      try {
        const extract = () => request(limitedApp.getHttpServer()).post('/api/tools/measurements/extract').send({ text: 'a thou' });
        for (let i = 0; i < 3; i += 1) await extract().expect(200);
        const limited = await extract().expect(429);
        expect(limited.body).toMatchObject({
          statusCode: 429,
          message: 'Too many calculator requests from this address. Please wait a minute and try again.',
        });
        expect(Number(limited.headers['retry-after-tools-text'])).toBeGreaterThan(0);
        // Parsing shares the text budget; the fit calculator does not.
        await request(limitedApp.getHttpServer()).post('/api/tools/transcripts/parse').send({ text: 'WEBVTT\n' }).expect(429);
        await request(limitedApp.getHttpServer()).get('/api/tools/fits?size=25&unit=mm&hole=H7&shaft=g6').expect(200);
      } finally {
        await limitedApp.close();
      }
    });

    it('counts every calculator route against one budget per address', async () => {
      const limitedApp = await createTestApp(limitedEnv({ TOOLS_RATE_LIMIT: '4', TOOLS_TEXT_RATE_LIMIT: '100' }));
      try {
        const server = limitedApp.getHttpServer();
        await request(server).get('/api/tools/fits?size=25&unit=mm&hole=H7&shaft=g6').expect(200);
        await request(server).get('/api/tools/fits?size=10&unit=mm&hole=H7&shaft=h6').expect(200);
        await request(server).post('/api/tools/measurements/extract').send({ text: '22 mm' }).expect(200);
        await request(server).post('/api/tools/transcripts/parse').send({ text: 'WEBVTT\n' }).expect(200);
        const limited = await request(server).get('/api/tools/fits?size=25&unit=mm&hole=H7&shaft=g6').expect(429);
        expect(limited.headers['retry-after-tools']).toBeDefined();
      } finally {
        await limitedApp.close();
      }
    });
  });
});
