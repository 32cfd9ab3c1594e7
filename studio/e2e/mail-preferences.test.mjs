// Mail preferences journey: a reader follows an assembly (through the API); the creator confirms its check and the
// reader's "Fit confirmed" mail carries a preferences link. Opened in a signed-out browser, the link's page shows the
// follow's delivery and the digest time, and saves a daily digest at 18:00 Berlin time; the account page, signed in,
// shows the same settings. An incomplete or unknown link reads as a sentence.
import assert from 'node:assert/strict';
import { mkdirSync } from 'node:fs';
import { after, before, test } from 'node:test';
import { baseUrl, launchBrowser } from './browser.mjs';
import { confirmCheckWithReading, mailIds, publishGuideWithOpenCheck, signUpThroughApi, waitForMail } from './support.mjs';

const screenshots = new URL('./screenshots/', import.meta.url);
mkdirSync(screenshots, { recursive: true });
const shot = (page, name) => page.screenshot({ path: new URL(`mail-preferences-${name}.png`, screenshots).pathname, fullPage: true });

const run = `${Date.now().toString(36)}${Math.floor(Math.random() * 1e4)}`;
const creator = { displayName: 'Ash Penrose', email: `ash-prefs-${run}@harrow-lane.example`, password: 'journey password 2026' };
const reader = { displayName: 'Morgan Tull', email: `morgan-prefs-${run}@reader.example`, password: 'journey password 2026' };
const assemblyName = `21-tooth coupler stack ${run}`;
const checkTitle = `Coupler slides onto the motor shaft ${run}`;

let browser;
let creatorContext;
let readerContext;
let readerApi;
const ids = {};

before(async () => {
  browser = await launchBrowser();
  creatorContext = await browser.newContext();
  const creatorApi = await signUpThroughApi(creatorContext, creator);
  Object.assign(
    ids,
    await publishGuideWithOpenCheck(creatorApi, {
      workshopName: `Harrow Lane Garage ${run}`,
      workshopSlug: `harrow-prefs-${run}`,
      assemblyName,
      checkTitle,
      guideTitle: `Fitting the coupler ${run}`,
    }),
  );
  readerContext = await browser.newContext({ viewport: { width: 1280, height: 900 } });
  readerApi = await signUpThroughApi(readerContext, reader);
  await readerApi.post('/follows', { targetKind: 'assembly', targetId: ids.assemblyId });
  const before = await mailIds(reader.email);
  await confirmCheckWithReading(creatorApi, ids);
  ids.mail = await waitForMail(reader.email, new RegExp(`^Fit confirmed: ${checkTitle}$`), 20_000, before);
});
after(async () => {
  await creatorContext?.close();
  await readerContext?.close();
  await browser?.close();
});

test('the preferences link of a fit-news mail opens signed out and sets a daily digest at a local hour', async () => {
  const link = (ids.mail.text.match(/https?:\/\/\S+/g) ?? []).map((url) => new URL(url)).find((url) => url.pathname === '/mail-preferences');
  assert.ok(link?.searchParams.get('token'), `a /mail-preferences link with a token in:\n${ids.mail.text}`);

  const context = await browser.newContext({ viewport: { width: 1280, height: 900 } });
  const page = await context.newPage();
  await page.goto(new URL(`${link.pathname}${link.search}`, baseUrl).href);
  await page.getByRole('heading', { name: 'Mail preferences' }).waitFor();
  await page.getByText(`Mail goes to ${reader.email}.`).waitFor();
  const delivery = page.getByRole('combobox', { name: `Delivery for ${assemblyName}` });
  assert.equal(await delivery.inputValue(), 'at_once');
  await shot(page, '01-from-the-mail');

  await delivery.selectOption({ label: 'Daily digest' });
  await page.getByRole('combobox', { name: 'Hour' }).selectOption({ label: '18:00' });
  await page.getByRole('combobox', { name: 'Time zone' }).selectOption('Europe/Berlin');
  await page.getByRole('button', { name: 'Save mail preferences' }).click();
  await page.getByTestId('preferences-saved').waitFor();
  await shot(page, '02-saved');

  const saved = await readerApi.get('/follows/preferences');
  assert.equal(saved.timeZone, 'Europe/Berlin');
  assert.equal(saved.digestHour, 18);
  assert.deepEqual(
    saved.follows.map(({ label, delivery: chosen }) => ({ label, delivery: chosen })),
    [{ label: assemblyName, delivery: 'daily' }],
  );

  // Read again: the page shows what is stored.
  await page.reload();
  assert.equal(await page.getByRole('combobox', { name: `Delivery for ${assemblyName}` }).inputValue(), 'daily');
  assert.equal(await page.getByRole('combobox', { name: 'Time zone' }).inputValue(), 'Europe/Berlin');
  await context.close();
});

test('the account page shows the same preferences to the signed-in reader', async () => {
  const page = await readerContext.newPage();
  await page.goto(`${baseUrl}/account`);
  const section = page.getByRole('region', { name: 'Mail preferences' });
  await section.getByRole('combobox', { name: `Delivery for ${assemblyName}` }).waitFor();
  assert.equal(await section.getByRole('combobox', { name: `Delivery for ${assemblyName}` }).inputValue(), 'daily');
  assert.equal(await section.getByRole('combobox', { name: 'Hour' }).inputValue(), '18');
  await section.getByRole('combobox', { name: `Delivery for ${assemblyName}` }).selectOption({ label: 'Paused' });
  await section.getByRole('button', { name: 'Save mail preferences' }).click();
  await section.getByTestId('preferences-saved').waitFor();
  assert.equal((await readerApi.get('/follows/preferences')).follows[0].delivery, 'paused');
  await shot(page, '03-account');
  await page.close();
});

test('a preferences link that is cut short or unknown reads as a sentence', async () => {
  const context = await browser.newContext();
  const page = await context.newPage();
  await page.goto(`${baseUrl}/mail-preferences`);
  await page.getByRole('alert').filter({ hasText: 'This link is incomplete' }).waitFor();
  await page.goto(`${baseUrl}/mail-preferences?token=not-a-real-token-${run}`);
  await page.getByRole('alert').filter({ hasText: 'We do not know this link' }).waitFor();
  await context.close();
});
