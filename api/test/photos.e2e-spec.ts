import { NestExpressApplication } from '@nestjs/platform-express';
import { createTestApp } from './create-test-app';
import { ONE_PIXEL_PNG as PNG } from './support/images';
import { signUpAndSignIn, TestAccount, uniqueSlug } from './support/accounts';

jest.setTimeout(60_000);


describe('part photos and photo evidence (real MariaDB and S3 fake)', () => {
  let app: NestExpressApplication;
  let creator: TestAccount;
  let base: string;

  beforeAll(async () => {
    app = await createTestApp();
    creator = await signUpAndSignIn(app);
    const workshop = await creator.agent.post('/api/workshops').send({ name: 'Photo Bay', slug: uniqueSlug('photos') }).expect(201);
    base = `/api/workshops/${workshop.body.id}`;
  });
  afterAll(async () => app.close());

  it('stores a part photo in storage and serves it through a short-lived link', async () => {
    const part = (await creator.agent.post(`${base}/parts`).send({ partNumber: 'PB-1', title: 'Bracket', category: 'plate' }).expect(201)).body;
    const added = await creator.agent.post(`${base}/parts/${part.id}/photos`).attach('photo', PNG, 'stamp.png').expect(201);
    expect(added.body.photos).toHaveLength(1);
    const [photo] = added.body.photos as { id: string; url: string }[];
    expect(photo.url).toBe(`${base}/parts/${part.id}/photos/${photo.id}`);

    const redirect = await creator.agent.get(photo.url).expect(302);
    const stored = await fetch(redirect.headers.location);
    expect(stored.status).toBe(200);
    expect(Buffer.from(await stored.arrayBuffer()).equals(PNG)).toBe(true);

    await creator.agent.delete(photo.url).expect(204);
    expect((await creator.agent.get(`${base}/parts/${part.id}`).expect(200)).body.photos).toEqual([]);
    expect((await fetch(redirect.headers.location)).status).toBe(404);
  });

  it('refuses a file that is not an image, whatever its name', async () => {
    const part = (await creator.agent.post(`${base}/parts`).send({ partNumber: 'PB-2', title: 'Bracket', category: 'plate' }).expect(201)).body;
    const refused = await creator.agent
      .post(`${base}/parts/${part.id}/photos`)
      .attach('photo', Buffer.from('<svg xmlns="http://www.w3.org/2000/svg"/>'), 'sneaky.png')
      .expect(400);
    expect(refused.body).toMatchObject({ message: 'The photo must be a PNG, JPEG or WebP image', errors: { photo: 'PNG, JPEG or WebP only' } });
    const wrongField = await creator.agent.post(`${base}/parts/${part.id}/photos`).attach('picture', PNG, 'a.png').expect(400);
    expect(wrongField.body.message).toBe('Send one image in the "photo" field');
  });

  it('confirms a manual check with a photo of the test fit as its evidence', async () => {
    const build = (await creator.agent.post(`${base}/builds`).send({ title: 'Photo build' }).expect(201)).body;
    const assembly = (await creator.agent.post(`${base}/builds/${build.id}/assemblies`).send({ name: 'stack' }).expect(201)).body;
    const check = (
      await creator.agent.post(`${base}/assemblies/${assembly.id}/checks`).send({ title: 'Test-fitted on the vehicle' }).expect(201)
    ).body;
    const evidence = await creator.agent
      .post(`${base}/checks/${check.id}/photos`)
      .field('note', 'Bolted up, turns by hand')
      .attach('photo', PNG, 'fit.png')
      .expect(201);
    expect(evidence.body).toMatchObject({ kind: 'photo', note: 'Bolted up, turns by hand' });
    const redirect = await creator.agent.get(evidence.body.photoUrl).expect(302);
    expect((await fetch(redirect.headers.location)).status).toBe(200);

    await creator.agent.post(`${base}/checks/${check.id}/transitions`).send({ to: 'confirmed', reason: 'test fit photographed' }).expect(201);
    const checklist = await creator.agent.get(`${base}/assemblies/${assembly.id}/checklist`).expect(200);
    expect(checklist.body).toMatchObject({ verdict: 'confirmed', checks: [{ state: 'confirmed', evidence: [{ kind: 'photo' }] }] });
  });
});
