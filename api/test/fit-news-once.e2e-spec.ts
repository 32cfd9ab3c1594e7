import { NestExpressApplication } from '@nestjs/platform-express';
import request from 'supertest';
import { createTestApp } from './create-test-app';
import { signUpAndSignIn, TestAccount, uniqueSlug } from './support/accounts';
import { inboxSnapshot, listMail, tokenFrom, waitForMail, type InboxMessage } from './support/mail-inbox';

jest.setTimeout(120_000);

/** Gives the notifications and mail jobs time to send anything still queued, before counting what arrived. */
const settle = () => new Promise((resolve) => setTimeout(resolve, 3000));

/** Every message the fake holds to `address` whose subject is exactly `subject`. */
async function mailsTo(address: string, subject: string): Promise<InboxMessage[]> {
  return (await listMail()).filter(
    (message) => message.subject === subject && message.to.some((to) => to.address.toLowerCase() === address.toLowerCase()),
  );
}

/** The one-click address from a List-Unsubscribe header: `<https://…>`. */
function oneClickUrl(message: InboxMessage): URL {
  const header = message.headers?.['list-unsubscribe'] ?? '';
  const match = /^<(https?:\/\/[^>]+)>$/.exec(header);
  if (!match) throw new Error(`"${message.subject}" has no one-click List-Unsubscribe header: ${header || 'none'}`);
  return new URL(match[1]);
}

/**
 * Fit news that neither doubles nor outstays its welcome: a double-clicked Confirm is one change and one
 * mail per person; a mail's unsubscribe stops what sent it and names what else still would; the mail to
 * a fit reporter carries the same one-click way out (RFC 8058).
 */
describe('fit news: one change, one mail, one working way out (real MariaDB, Redis, mail fake)', () => {
  let app: NestExpressApplication;
  let owner: TestAccount;
  let closeFollower: TestAccount; // follows the assembly and its build
  let shopFollower: TestAccount; // follows the workshop
  let reporter: TestAccount; // sent a fit report the first check verifies
  let base: string;
  let doubleClickedCheck: string;
  let secondCheck: string;
  let thirdCheck: string;
  let measurementId: string;
  let buildFollowId: string;
  let shopFollowId: string;

  const confirm = (checkId: string, reason: string) =>
    owner.agent.post(`${base}/checks/${checkId}/transitions`).send({ to: 'confirmed', reason });

  beforeAll(async () => {
    app = await createTestApp();
    [owner, closeFollower, shopFollower, reporter] = await Promise.all([
      signUpAndSignIn(app),
      signUpAndSignIn(app),
      signUpAndSignIn(app),
      signUpAndSignIn(app),
    ]);
    const workshopSlug = uniqueSlug('once');
    const workshopId = (await owner.agent.post('/api/workshops').send({ name: 'Once Shop', slug: workshopSlug }).expect(201)).body.id;
    base = `/api/workshops/${workshopId}`;
    const buildId = (await owner.agent.post(`${base}/builds`).send({ title: 'Swap build' }).expect(201)).body.id;
    const part = (
      await owner.agent
        .post(`${base}/parts`)
        .send({ partNumber: 'ON-1', title: 'Once coupler', category: 'coupler', features: [{ name: 'bore', kind: 'diameter', role: 'hole', nominal: '15', unit: 'mm' }] })
        .expect(201)
    ).body;
    const assemblyId = (await owner.agent.post(`${base}/builds/${buildId}/assemblies`).send({ name: 'Swap stack' }).expect(201)).body.id;
    await owner.agent.put(`${base}/assemblies/${assemblyId}/parts/${part.id}`).send({ position: 'input side' }).expect(204);
    const addCheck = async (title: string) => (await owner.agent.post(`${base}/assemblies/${assemblyId}/checks`).send({ title }).expect(201)).body.id as string;
    doubleClickedCheck = await addCheck('Coupler seats on the shaft');
    secondCheck = await addCheck('Adapter plate clears the starter');
    thirdCheck = await addCheck('Shaft turns by hand');
    measurementId = (
      await owner.agent
        .post(`${base}/measurements`)
        .send({ featureId: part.features[0].id, quantity: 'diameter', value: '15.006', unit: 'mm', instrumentKind: 'bore_gauge', resolution: '0.001' })
        .expect(201)
    ).body.id;
    for (const checkId of [doubleClickedCheck, secondCheck, thirdCheck]) {
      await owner.agent.post(`${base}/checks/${checkId}/evidence`).send({ kind: 'measurement', measurementId }).expect(201);
    }
    const guideId = (await owner.agent.post(`${base}/builds/${buildId}/guides`).send({ title: 'Once guide', assemblyId }).expect(201)).body.id;
    await owner.agent.post(`${base}/guides/${guideId}/steps`).send({ title: 'Fit it' }).expect(201);
    await owner.agent.post(`${base}/guides/${guideId}/revisions`).send({}).expect(201);

    await closeFollower.agent.post('/api/follows').send({ targetKind: 'assembly', targetId: assemblyId }).expect(201);
    buildFollowId = (await closeFollower.agent.post('/api/follows').send({ targetKind: 'build', targetId: buildId }).expect(201)).body.id;
    shopFollowId = (await shopFollower.agent.post('/api/follows').send({ targetKind: 'workshop', targetId: workshopId }).expect(201)).body.id;
    const reportId = (
      await reporter.agent.post(`/api/guides/${workshopSlug}/once-guide/fit-reports`).send({ outcome: 'fit', parts: 'ON-1 on a 5-speed input shaft' }).expect(201)
    ).body.id;
    await owner.agent.patch(`${base}/fit-reports/${reportId}`).send({ fitCheckId: doubleClickedCheck }).expect(200);
  });
  afterAll(async () => app.close());

  it('a double-clicked Confirm is one change in the history and one mail per person', async () => {
    const subject = 'Fit confirmed: Coupler seats on the shaft';
    // Four identical requests at once (a double click, twice over): the check is read "open" by each.
    const answers = await Promise.all([1, 2, 3, 4].map(() => confirm(doubleClickedCheck, 'Seated fully, shaft turns by hand')));
    expect(answers.map((answer) => answer.status).sort()).toEqual([201, 409, 409, 409]);
    for (const refused of answers.filter((answer) => answer.status === 409)) {
      expect(refused.body).toMatchObject({ statusCode: 409, code: 'already_in_state', state: 'confirmed', message: 'The check is already confirmed.' });
    }
    // A repeat after the fact answers the same, and a change from a state the check has left is refused.
    expect((await confirm(doubleClickedCheck, 'again').expect(409)).body).toMatchObject({ code: 'already_in_state', state: 'confirmed' });
    const stale = await owner.agent.post(`${base}/checks/${doubleClickedCheck}/transitions`).send({ to: 'no_fit', reason: 'stale tab', from: 'open' }).expect(409);
    expect(stale.body).toMatchObject({ code: 'state_changed', state: 'confirmed' });

    const history = (await owner.agent.get(`${base}/checks/${doubleClickedCheck}/history`).expect(200)).body as { to: string }[];
    expect(history.filter((entry) => entry.to === 'confirmed')).toHaveLength(1);
    expect(history).toHaveLength(2); // "added by hand", then the one confirmation

    await Promise.all([closeFollower, shopFollower, reporter].map((person) => waitForMail(person.email, { subject })));
    await settle();
    for (const person of [closeFollower, shopFollower, reporter]) expect(await mailsTo(person.email, subject)).toHaveLength(1);
  });

  it('unsubscribing stops the follow that sent the mail, names the one that still would, and stops that too in one click', async () => {
    const first = await waitForMail(closeFollower.email, { subject: 'Fit confirmed: Coupler seats on the shaft' });
    expect(first.text).toContain('You get this because you follow Swap stack.');
    const token = tokenFrom(first, '/unsubscribe');
    const anonymous = request(app.getHttpServer());

    const stopped = await anonymous.post('/api/follows/unsubscribe').send({ token }).expect(200);
    expect(stopped.body).toMatchObject({ status: 'unfollowed', stopped: 'follow', label: 'Swap stack' });
    expect(stopped.body.stillFollowing.map((follow: { id: string; targetKind: string; label: string }) => [follow.id, follow.targetKind, follow.label])).toEqual([
      [buildFollowId, 'build', 'Swap build'],
    ]);

    // Kept on purpose: the build follow still brings news of the assembly, and the mail says so.
    const secondSubject = 'Fit confirmed: Adapter plate clears the starter';
    const before = await inboxSnapshot(closeFollower.email);
    await confirm(secondCheck, 'Starter bolts in with the plate fitted').expect(201);
    const second = await waitForMail(closeFollower.email, { subject: secondSubject, excluding: before });
    expect(second.text).toContain('You get this because you follow Swap build.');

    // The first mail's link may stop only the person's own follows that cover this assembly.
    const notTheirs = await anonymous.post('/api/follows/unsubscribe').send({ token, followId: shopFollowId }).expect(404);
    expect(notTheirs.body.errors).toHaveProperty('followId');
    expect((await shopFollower.agent.get('/api/follows').expect(200)).body).toHaveLength(1);

    const alsoStopped = await anonymous.post('/api/follows/unsubscribe').send({ token, followId: buildFollowId }).expect(200);
    expect(alsoStopped.body).toMatchObject({ status: 'unfollowed', label: 'Swap stack', stillFollowing: [] });
    expect((await closeFollower.agent.get('/api/follows').expect(200)).body).toEqual([]);
    expect((await anonymous.post('/api/follows/unsubscribe').send({ token }).expect(200)).body).toMatchObject({ status: 'already', stillFollowing: [] });

    // Nothing more about this assembly: the workshop's follower hears of the next change, this person does not.
    const thirdSubject = 'Fit confirmed: Shaft turns by hand';
    await confirm(thirdCheck, 'Turns by hand with the motor bolted up').expect(201);
    await waitForMail(shopFollower.email, { subject: thirdSubject });
    await settle();
    expect(await mailsTo(closeFollower.email, thirdSubject)).toEqual([]);
  });

  it('the mail to a fit reporter carries the one-click unsubscribe (RFC 8058) and a link, both stopping that report’s news', async () => {
    const mail = await waitForMail(reporter.email, { subject: 'Fit confirmed: Coupler seats on the shaft' });
    expect(mail.text).toContain('You get this because you sent a fit report that this check verifies. To stop news about your report, open ');
    expect(mail.headers?.['list-unsubscribe-post']).toBe('List-Unsubscribe=One-Click');
    const oneClick = oneClickUrl(mail);
    expect(oneClick.pathname).toBe('/api/follows/unsubscribe');
    // The page link and the header carry the same token.
    expect(oneClick.searchParams.get('token')).toBe(tokenFrom(mail, '/unsubscribe'));

    // What a mail client sends for one-click: the token in the address, the fixed form body.
    const anonymous = request(app.getHttpServer());
    const stopped = await anonymous.post(`${oneClick.pathname}${oneClick.search}`).type('form').send('List-Unsubscribe=One-Click').expect(200);
    expect(stopped.body).toEqual({ status: 'unfollowed', stopped: 'report', label: 'your fit report', stillFollowing: [] });
    expect((await anonymous.post(`${oneClick.pathname}${oneClick.search}`).type('form').send('List-Unsubscribe=One-Click').expect(200)).body.status).toBe('already');

    // The next news of that check reaches the workshop's follower, not the reporter.
    const noFit = 'No fit: Coupler seats on the shaft';
    await owner.agent.post(`${base}/checks/${doubleClickedCheck}/transitions`).send({ to: 'no_fit', reason: 'Second coupler from the box is undersize', from: 'confirmed' }).expect(201);
    await waitForMail(shopFollower.email, { subject: noFit });
    await settle();
    expect(await mailsTo(reporter.email, noFit)).toEqual([]);
  });
});
