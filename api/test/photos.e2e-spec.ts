import { NestExpressApplication } from '@nestjs/platform-express';
import { createTestApp } from './create-test-app';
import { ONE_PIXEL_PNG as PNG } from './support/images';
import { browserAgent, signUpAndSignIn, TestAccount, uniqueSlug } from './support/accounts';

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

  it('shows a published guide’s photo evidence to anyone, and nothing that is not in its live checklist', async () => {
    const workshop = (await creator.agent.post('/api/workshops').send({ name: 'Photo Guides', slug: uniqueSlug('photo-guide') }).expect(201)).body;
    const w = `/api/workshops/${workshop.id}`;
    const build = (await creator.agent.post(`${w}/builds`).send({ title: 'Photo guide build' }).expect(201)).body;
    const assembly = (await creator.agent.post(`${w}/builds/${build.id}/assemblies`).send({ name: 'stack' }).expect(201)).body;
    const other = (await creator.agent.post(`${w}/builds/${build.id}/assemblies`).send({ name: 'another stack' }).expect(201)).body;
    const check = (await creator.agent.post(`${w}/assemblies/${assembly.id}/checks`).send({ title: 'Seated on the shaft' }).expect(201)).body;
    const otherCheck = (await creator.agent.post(`${w}/assemblies/${other.id}/checks`).send({ title: 'Elsewhere' }).expect(201)).body;
    const photo = (await creator.agent.post(`${w}/checks/${check.id}/photos`).field('note', 'Seated').attach('photo', PNG, 'seated.png').expect(201)).body;
    const elsewhere = (await creator.agent.post(`${w}/checks/${otherCheck.id}/photos`).attach('photo', PNG, 'other.png').expect(201)).body;
    const guide = (await creator.agent.post(`${w}/builds/${build.id}/guides`).send({ assemblyId: assembly.id, title: 'Photo guide' }).expect(201)).body;
    await creator.agent.post(`${w}/guides/${guide.id}/steps`).send({ title: 'Seat it' }).expect(201);
    await creator.agent.post(`${w}/guides/${guide.id}/revisions`).send({ note: 'First' }).expect(201);

    const reader = await browserAgent(app);
    const publicPath = `/api/guides/${workshop.slug}/${guide.slug}`;
    const read = await reader.get(publicPath).expect(200);
    const [evidence] = read.body.checklist.checks[0].evidence as { kind: string; label: string; photoUrl: string }[];
    expect(evidence).toEqual({ kind: 'photo', label: 'Seated', startMs: null, photoUrl: `${publicPath}/evidence/${photo.id}/photo` });
    const redirect = await reader.get(evidence.photoUrl).expect(302);
    const stored = await fetch(redirect.headers.location);
    expect(Buffer.from(await stored.arrayBuffer()).equals(PNG)).toBe(true);

    // Another assembly's photo, through this guide's path: not found, as is a photo of a retired check.
    await reader.get(`${publicPath}/evidence/${elsewhere.id}/photo`).expect(404);
    await creator.agent.post(`${w}/checks/${check.id}/transitions`).send({ to: 'retired', reason: 'superseded' }).expect(201);
    await reader.get(evidence.photoUrl).expect(404);
    await reader.get(`${publicPath}/evidence/not-a-uuid/photo`).expect(400);
  });
});
