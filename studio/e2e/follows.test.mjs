// Follows journey: a creator publishes a guide (through the API) whose assembly has an open manual fit check.
// A second person, signed up through the API, opens the guide signed out, is sent to sign in and back (?next=),
// follows the assembly through the UI and sees it in their account. The creator confirms the check (a measurement
// as evidence); the follower's inbox gets "Fit confirmed: …" with a link to the guide's checklist, and the mail's
// stop link, opened in the browser, ends the follow.
import assert from 'node:assert/strict';
import { mkdirSync } from 'node:fs';
import { after, before, test } from 'node:test';
import { baseUrl, launchBrowser } from './browser.mjs';
import { apiClient, confirmCheckWithReading, mailIds, publishGuideWithOpenCheck, signUpThroughApi, waitForMail } from './support.mjs';

const screenshots = new URL('./screenshots/', import.meta.url);
mkdirSync(screenshots, { recursive: true });
const shot = (page, name) => page.screenshot({ path: new URL(`follows-${name}.png`, screenshots).pathname, fullPage: true });

const run = `${Date.now().toString(36)}${Math.floor(Math.random() * 1e4)}`;
const creator = { displayName: 'Ash Penrose', email: `ash-follows-${run}@harrow-lane.example`, password: 'journey password 2026' };
const viewer = { displayName: 'Morgan Tull', email: `morgan-follows-${run}@reader.example`, password: 'journey password 2026' };
const assemblyName = `21-tooth coupler stack ${run}`;
const checkTitle = `Coupler slides onto the motor shaft ${run}`;
const guideTitle = `Fitting the coupler ${run}`;

/** The link in the message whose path is `path`, pointed at the app under test. */
function linkIn(message, path) {
  const link = (message.text.match(/https?:\/\/\S+/g) ?? []).map((url) => new URL(url)).find((url) => url.pathname === path);
  assert.ok(link, `a ${path} link in "${message.subject}":\n${message.text}`);
  return link;
}

let browser;
let creatorApi;
let creatorContext;
const ids = {};

before(async () => {
  browser = await launchBrowser();
  creatorContext = await browser.newContext();
  creatorApi = await signUpThroughApi(creatorContext, creator);
  Object.assign(
    ids,
    await publishGuideWithOpenCheck(creatorApi, {
      workshopName: `Harrow Lane Garage ${run}`,
      workshopSlug: `harrow-follows-${run}`,
      assemblyName,
      checkTitle,
      guideTitle,
    }),
  );

  // The follower has an account already, made in a browser of their own.
  const signUpContext = await browser.newContext();
  await signUpThroughApi(signUpContext, viewer);
  await signUpContext.close();
});
after(async () => {
  await creatorContext?.close();
  await browser?.close();
});

test('a reader follows an assembly, is e-mailed when its fit is confirmed, and stops from the e-mail', async () => {
  const context = await browser.newContext({ viewport: { width: 1280, height: 900 } });
  const page = await context.newPage();
  const guidePath = `/guides/${ids.workshopSlug}/${ids.guideSlug}`;

  // Signed out: the guide offers to sign in, and says what following does.
  await page.goto(`${baseUrl}${guidePath}`);
  await page.getByRole('heading', { level: 1, name: guideTitle }).waitFor();
  const control = page.getByTestId('follow-control');
  await control.getByText('We e-mail you when a fit check here is confirmed or fails.').waitFor();
  await shot(page, '01-signed-out');
  await control.getByRole('link', { name: 'Sign in to follow' }).click();
  await page.waitForURL(`${baseUrl}/sign-in?next=${encodeURIComponent(guidePath)}`);
  await page.getByLabel('E-mail address').fill(viewer.email);
  await page.getByRole('textbox', { name: 'Password' }).fill(viewer.password);
  await page.getByRole('button', { name: 'Sign in' }).click();

  // Back on the guide, signed in: follow the checklist's assembly.
  await page.waitForURL(`${baseUrl}${guidePath}`);
  await page.getByRole('heading', { level: 1, name: guideTitle }).waitFor();
  await control.getByRole('button', { name: 'Follow', exact: true }).click();
  const choices = page.getByRole('group', { name: 'What to follow' });
  const assemblyBox = choices.getByRole('checkbox', { name: `Assembly: ${assemblyName}` });
  await assemblyBox.waitFor();
  assert.equal(await choices.getByRole('checkbox').count(), 3, 'the assembly, the build and the workshop');
  await choices.getByRole('checkbox', { name: 'Build: Motor-to-gearbox coupler' }).waitFor();
  await choices.getByRole('checkbox', { name: `Workshop: Harrow Lane Garage ${run}` }).waitFor();
  await assemblyBox.check();
  await page.getByTestId('follow-summary').filter({ hasText: 'You follow this assembly.' }).waitFor();
  assert.equal(await assemblyBox.isChecked(), true);
  await control.getByRole('button', { name: 'Following (1)' }).waitFor();
  await shot(page, '02-following');
  await page.keyboard.press('Escape');

  const viewerApi = apiClient(context);
  const follows = await viewerApi.get('/follows');
  assert.deepEqual(
    follows.map(({ targetKind, targetId, label }) => ({ targetKind, targetId, label })),
    [{ targetKind: 'assembly', targetId: ids.assemblyId, label: assemblyName }],
  );

  // The account page lists it, with its kind in words and its workshop.
  await page.goto(`${baseUrl}/account`);
  const row = page.getByRole('table', { name: 'What you follow' }).getByTestId('follow-row');
  await row.filter({ hasText: assemblyName }).waitFor();
  assert.match(await row.textContent(), new RegExp(`${assemblyName}AssemblyHarrow Lane Garage ${run}Unfollow`));
  await shot(page, '03-account');

  // The creator confirms the check on the vehicle, with a measurement as its evidence.
  const before = await mailIds(viewer.email);
  const creatorMail = await mailIds(creator.email);
  await confirmCheckWithReading(creatorApi, ids);

  const mail = await waitForMail(viewer.email, new RegExp(`^Fit confirmed: ${checkTitle}$`), 20_000, before);
  assert.match(mail.text, /Test-fitted on the vehicle/);
  const guideLink = linkIn(mail, guidePath);
  assert.equal(guideLink.hash, '#checklist');
  const stopLink = linkIn(mail, '/unsubscribe');
  assert.ok(stopLink.searchParams.get('token'), 'the stop link carries its token');
  // The creator made the change and follows nothing: no news for them.
  assert.equal((await mailIds(creator.email)).size, creatorMail.size);

  // The mail's checklist link shows the check confirmed.
  await page.goto(new URL(`${guideLink.pathname}${guideLink.hash}`, baseUrl).href);
  const checkRow = page.getByTestId('guide-check').filter({ hasText: checkTitle });
  await checkRow.getByTestId('check-state').filter({ hasText: 'Confirmed on the vehicle' }).waitFor();

  // The stop link, opened in the browser, ends the follow; opened again, it says so.
  await page.goto(new URL(`${stopLink.pathname}${stopLink.search}`, baseUrl).href);
  const outcome = page.getByTestId('unsubscribe-outcome');
  await outcome.filter({ hasText: `You will no longer get fit news about ${assemblyName}.` }).waitFor();
  await shot(page, '04-unsubscribed');
  assert.deepEqual(await viewerApi.get('/follows'), []);
  await page.reload();
  await outcome.filter({ hasText: `You had already stopped fit news about ${assemblyName}.` }).waitFor();

  await page.goto(`${baseUrl}/account`);
  await page.getByTestId('following-empty').waitFor();
  await context.close();
});

test('an unknown stop link reads as a sentence', async () => {
  const context = await browser.newContext();
  const page = await context.newPage();
  await page.goto(`${baseUrl}/unsubscribe?token=not-a-real-token-${run}`);
  await page.getByRole('alert').filter({ hasText: 'We do not know this link' }).waitFor();
  await shot(page, '05-unknown-link');
  await context.close();
});
