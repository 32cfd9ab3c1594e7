import { NestExpressApplication } from '@nestjs/platform-express';
import request from 'supertest';
import { createTestApp } from './create-test-app';

/*
 * Spline tools over HTTP. Expected values are worked by hand from the ANSI B92.1 and
 * ISO 4156 / ANSI B92.2M basic-dimension equations (recalled from the standards), working beside each.
 */
describe('spline tools (GET /api/tools/splines, /api/tools/splines/identify)', () => {
  let app: NestExpressApplication;
  beforeAll(async () => {
    app = await createTestApp();
  });
  afterAll(async () => app.close());

  const get = (path: string) => request(app.getHttpServer()).get(path);

  describe('basic dimensions', () => {
    it('21T 16/32 30° flat root side fit, in inches with the exact millimetres', async () => {
      const response = await get('/api/tools/splines?teeth=21&pitch=16%2F32&pressureAngle=30&root=flat&fit=side').expect(200);
      expect(response.body).toMatchObject({ designation: '21T 16/32 DP 30° flat root side fit (ANSI B92.1)', standard: 'ANSI B92.1', unit: 'in' });
      const dims = response.body.dimensions;
      expect(dims.pitchDiameter).toEqual({ value: 1.3125, unit: 'in', converted: { value: 33.3375, unit: 'mm' } }); // 21/16 in × 25.4
      expect(dims.externalMajorDiameter).toEqual({ value: 1.375, unit: 'in', converted: { value: 34.925, unit: 'mm' } }); // (21 + 1)/16
      expect(dims.internalMajorDiameter.value).toBe(1.396875); // (21 + 1.35)/16
      expect(dims.internalMinorDiameter.value).toBe(1.25); // (21 − 1)/16
      expect(dims.externalMinorDiameter.value).toBe(1.228125); // (21 − 1.35)/16
    });

    it('reads "20 DP" and "m1.25", and defaults to a 30° flat root side fit', async () => {
      const inch = await get('/api/tools/splines?teeth=20&pitch=20%20DP').expect(200);
      expect(inch.body).toMatchObject({ pitch: '20/40', pressureAngle: 30, root: 'flat', fit: 'side' });
      expect(inch.body.dimensions.externalMajorDiameter.value).toBe(1.05); // (20 + 1)/20
      // 37.5° has fillet roots only, so the root may be left out.
      const metric = await get('/api/tools/splines?teeth=21&pitch=m1.25&pressureAngle=37.5').expect(200);
      expect(metric.body).toMatchObject({ standard: 'ISO 4156 / ANSI B92.2M', unit: 'mm', root: 'fillet' });
      expect(metric.body.dimensions.externalMajorDiameter.value).toBe(27.375); // m (z + 0.9) = 1.25 × 21.9
      expect(metric.body.dimensions.internalMajorDiameter.value).toBe(28); // m (z + 1.4) = 1.25 × 22.4
    });

    it.each([
      ['teeth=21', /pitch/],
      ['teeth=abc&pitch=16/32', /teeth must be a whole number from 6 to 100/],
      ['teeth=21&pitch=fine', /cannot read spline pitch "fine"/],
      [`teeth=21&pitch=${'1'.repeat(5000)}`, /pitch must be at most 40 characters/],
      ['teeth=21&pitch=16/32&pressureAngle=20', /pressureAngle must be 30, 37.5 or 45/],
      ['teeth=21&pitch=16/32&pressureAngle=45&root=flat', /has no 45° flat root/],
      ['teeth=21&pitch=m1.3', /^pitch: module 1.3 is not an ISO 4156 module/],
      ['teeth=21&pitch=16/24', /^pitch: ANSI B92.1 stub pitches/],
      ['teeth=21&pitch=16/32&fit=loose', /fit must be side or major/],
    ])('refuses %s with a 400 naming the field', async (query, message) => {
      const response = await get(`/api/tools/splines?${query}`).expect(400);
      const text = Array.isArray(response.body.message) ? response.body.message.join('; ') : response.body.message;
      expect(text).toMatch(message);
    });
  });

  describe('identification', () => {
    it('a 20-tooth shaft at 26.67 mm is 20/40 DP, with the m1.25 swap pitfall flagged', async () => {
      // 20/40: (20 + 1)/20 = 1.05 in = 26.67 mm. m1.25: 1.25 × 21 = 26.25 mm, 0.42 mm under.
      const response = await get('/api/tools/splines/identify?teeth=20&majorDiameter=26.67&unit=mm').expect(200);
      expect(response.body.measured).toEqual({ value: 26.67, unit: 'mm', resolution: 0.01 });
      expect(response.body.candidates[0]).toMatchObject({ pitch: '20/40', deviation: { value: 0, unit: 'mm' }, explainsReading: true });
      expect(response.body.candidates).toEqual(
        expect.arrayContaining([expect.objectContaining({ pitch: 'm1.25', pressureAngle: 30, deviation: { value: 0.42, unit: 'mm' } })]),
      );
      expect(response.body.pitfalls[0]).toMatch(/inch\/metric swap/);
    });

    it('takes a hub bore as minorDiameter with the instrument resolution, in inches', async () => {
      // 21T 16/32: Di = (21 − 1)/16 = 1.25 in; the reading 1.2505 in is 0.0005 in over.
      const response = await get('/api/tools/splines/identify?teeth=21&minorDiameter=1.2505&unit=in&resolution=0.0001').expect(200);
      expect(response.body).toMatchObject({ feature: 'minor', measured: { value: 1.2505, unit: 'in', resolution: 0.0001 } });
      expect(response.body.candidates[0]).toMatchObject({ pitch: '16/32', deviation: { value: 0.0005, unit: 'in' } });
    });

    it.each([
      ['teeth=20&unit=mm', /majorDiameter must be a number/],
      ['teeth=20&majorDiameter=26.67&minorDiameter=25&unit=mm', /not both/],
      ['teeth=20&majorDiameter=26.67', /unit must be mm or in/],
      ['teeth=20&majorDiameter=-1&unit=mm', /majorDiameter must be greater than zero/],
      ['teeth=2&majorDiameter=26.67&unit=mm', /teeth must be a whole number from 6 to 100/],
      ['teeth=20&majorDiameter=26.6700001&unit=mm', /^majorDiameter: .*whole number of nanometres/],
    ])('refuses %s with a 400 naming the field', async (query, message) => {
      const response = await get(`/api/tools/splines/identify?${query}`).expect(400);
      const text = Array.isArray(response.body.message) ? response.body.message.join('; ') : response.body.message;
      expect(text).toMatch(message);
    });
  });

  it('documents both routes in the OpenAPI document', async () => {
    const response = await get('/api/docs/openapi.json').expect(200);
    const paths = response.body.paths as Record<string, { get?: { parameters?: { name: string }[] } }>;
    expect(paths['/api/tools/splines']?.get?.parameters?.map((p) => p.name)).toEqual(
      expect.arrayContaining(['teeth', 'pitch', 'pressureAngle', 'root', 'fit']),
    );
    expect(paths['/api/tools/splines/identify']?.get?.parameters?.map((p) => p.name)).toEqual(
      expect.arrayContaining(['teeth', 'majorDiameter', 'minorDiameter', 'unit', 'resolution']),
    );
  });
});
