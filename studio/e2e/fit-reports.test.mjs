// Fit reports journey: a creator publishes a guide (through the API) whose assembly has an open manual fit check.
// A reader, signed up through the API in a browser of their own, sends a report "It fit" with a photo from the
// guide. The creator finds it on the workshop's Fit reports page with its photo and ties it to the manual check,
// then confirms that check (a measurement as evidence, through the API); the reporter's inbox gets
// "Fit confirmed: …" and their account page lists the report with the check confirmed.
import assert from 'node:assert/strict';
import { execFileSync } from 'node:child_process';
import { mkdirSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { after, before, test } from 'node:test';
import { baseUrl, launchBrowser } from './browser.mjs';
import { apiClient, choose, confirmCheckWithReading, mailIds, publishGuideWithOpenCheck, signUpThroughApi, waitForMail } from './support.mjs';

const screenshots = new URL('./screenshots/', import.meta.url);
mkdirSync(screenshots, { recursive: true });
// Whole pages, except while a dialog floats over them (a full-page capture misplaces those).
const shot = (page, name, { fullPage = true } = {}) =>
  page.screenshot({ path: new URL(`fit-reports-${name}.png`, screenshots).pathname, fullPage, animations: 'disabled' });

const run = `${Date.now().toString(36)}${Math.floor(Math.random() * 1e4)}`;
const creator = { displayName: 'Ash Penrose', email: `ash-reports-${run}@harrow-lane.example`, password: 'journey password 2026' };
const reader = { displayName: 'Morgan Tull', email: `morgan-reports-${run}@reader.example`, password: 'journey password 2026' };
const workshopName = `Harrow Lane Garage ${run}`;
const assemblyName = `21-tooth coupler stack ${run}`;
const checkTitle = `Coupler slides onto the motor shaft ${run}`;
const guideTitle = `Fitting the coupler ${run}`;
const claimedParts = `HL-2107 coupler (Brackwater Drive) on the original gearbox input shaft ${run}`;

/** A small grey PNG made on the spot with ffmpeg; never a real photo. */
function makePhoto() {
  const file = join(mkdtempSync(join(tmpdir(), 'fitwright-fit-reports-')), 'coupler-on-shaft.png');
  execFileSync('ffmpeg', ['-v', 'error', '-y', '-f', 'lavfi', '-i', 'color=c=gray:s=64x64', '-frames:v', '1', file]);
  return file;
}

let browser;
let photo;
let creatorContext;
let creatorApi;
let readerContext;
const ids = {};

before(async () => {
  photo = makePhoto();
  browser = await launchBrowser();
  creatorContext = await browser.newContext({ viewport: { width: 1280, height: 900 } });
  creatorApi = await signUpThroughApi(creatorContext, creator);
  Object.assign(
    ids,
    await publishGuideWithOpenCheck(creatorApi, { workshopName, workshopSlug: `harrow-reports-${run}`, assemblyName, checkTitle, guideTitle }),
  );

  // The reader has an account and is signed in, in a browser of their own.
  readerContext = await browser.newContext({ viewport: { width: 1280, height: 900 } });
  await signUpThroughApi(readerContext, reader);
});
after(async () => {
  await readerContext?.close();
  await creatorContext?.close();
  await browser?.close();
  if (photo) rmSync(join(photo, '..'), { recursive: true, force: true });
});

test('a signed-out reader is offered to sign in to report a fit', async () => {
  const context = await browser.newContext();
  const page = await context.newPage();
  const guidePath = `/guides/${ids.workshopSlug}/${ids.guideSlug}`;
  await page.goto(`${baseUrl}${guidePath}`);
  await page.getByRole('heading', { level: 1, name: guideTitle }).waitFor();
  const link = page.getByTestId('report-fit').getByRole('link', { name: 'Sign in to report a fit' });
  assert.equal(await link.getAttribute('href'), `/sign-in?next=${encodeURIComponent(guidePath)}`);
  await shot(page, '00-signed-out', { fullPage: false });
  await context.close();
});

test('a reader reports a fit with a photo; the creator ties it to a check and confirms it; the reader hears', async () => {
  // The reader sends "It fit" from the guide, with a photo.
  const page = await readerContext.newPage();
  await page.goto(`${baseUrl}/guides/${ids.workshopSlug}/${ids.guideSlug}`);
  await page.getByRole('heading', { level: 1, name: guideTitle }).waitFor();
  await shot(page, '00-guide', { fullPage: false });
  await page.getByTestId('report-fit').getByRole('button', { name: 'Report a fit' }).click();
  const dialog = page.getByRole('dialog', { name: `Report a fit: ${guideTitle}` });
  const form = dialog.getByRole('form', { name: 'Report a fit' });
  await form.getByRole('button', { name: 'Send report' }).click();
  await form.getByText('Choose whether it fit').waitFor();
  await form.getByRole('radio', { name: 'It fit' }).check();
  await form.getByRole('textbox', { name: /What you combined/ }).fill(claimedParts);
  await form.getByRole('textbox', { name: /Vehicle/ }).fill('1984 compact pickup, 4x2, electric conversion');
  await form.getByRole('textbox', { name: /Notes/ }).fill('Slid on by hand after deburring the spline ends.');
  await form.getByTestId('report-photos-dropzone').locator('input[type=file]').setInputFiles(photo);
  await form.getByTestId('chosen-photo').filter({ hasText: 'coupler-on-shaft.png' }).waitFor();
  await shot(page, '01-report-form', { fullPage: false });
  await form.getByRole('button', { name: 'Send report' }).click();

  const sent = dialog.getByTestId('fit-report-sent');
  await sent.getByText(`Thanks — ${workshopName} will review it. You’ll be e-mailed if it is verified.`).waitFor();
  await sent.locator('[data-testid="photo-progress"][data-phase="sent"]').filter({ hasText: 'coupler-on-shaft.png' }).waitFor();
  await shot(page, '02-report-sent', { fullPage: false });
  await dialog.getByRole('button', { name: 'Close' }).click();

  // The creator finds it from the workshop's page tabs, under New, with the photo.
  const creatorPage = await creatorContext.newPage();
  await creatorPage.goto(`${baseUrl}/workshops/${ids.workshopId}`);
  await creatorPage.getByRole('tab', { name: 'Fit reports' }).click();
  await creatorPage.waitForURL(`${baseUrl}/workshops/${ids.workshopId}/fit-reports`);
  const filter = creatorPage.getByTestId('report-status-filter');
  await filter.getByText('New (1)').waitFor();
  const card = creatorPage.getByTestId('fit-report').filter({ hasText: claimedParts });
  await card.waitFor();
  assert.equal(await card.getByTestId('report-outcome').textContent(), 'It fit');
  assert.match(await card.getByTestId('report-origin').textContent(), new RegExp(`^From Morgan Tull · .* · ${guideTitle} · build Motor-to-gearbox coupler$`));
  await card.getByText('1984 compact pickup, 4x2, electric conversion').waitFor();
  const thumbnail = card.getByRole('button', { name: 'Enlarge photo 1 of 1' });
  const loads = await thumbnail.locator('img').evaluate((image) => image.decode().then(() => image.naturalWidth, () => 0));
  assert.equal(loads, 64, 'the photo loads through its redirect to storage');
  await shot(creatorPage, '03-workshop-new');
  await thumbnail.click();
  const enlarged = creatorPage.getByTestId('enlarged-photo');
  await enlarged.waitFor();
  await creatorPage.waitForFunction(() => document.querySelector('[data-testid="enlarged-photo"]')?.naturalWidth === 64);
  await shot(creatorPage, '04-photo-enlarged', { fullPage: false });
  await creatorPage.keyboard.press('Escape');
  await enlarged.waitFor({ state: 'detached' });

  // Tied to the manual check, the report moves on to Investigating.
  await card.getByRole('button', { name: 'Tie to a fit check' }).click();
  const tie = card.getByRole('form', { name: 'Tie to a fit check' });
  await tie.getByRole('combobox', { name: 'Assembly' }).and(creatorPage.locator(`[value="${assemblyName}"]`)).waitFor();
  await choose(tie, 'Fit check', `${checkTitle} (open)`);
  await shot(creatorPage, '05-tie', { fullPage: false });
  await tie.getByRole('button', { name: 'Tie' }).click();
  await filter.getByText('Investigating (1)').waitFor();
  await creatorPage.getByTestId('fit-reports-empty').waitFor();
  await filter.getByText('Investigating (1)').click();
  await creatorPage.waitForURL(/\?status=investigating$/);
  await card.getByTestId('report-check').filter({ hasText: `Tied to ${checkTitle} (${assemblyName})` }).waitFor();
  await card.getByRole('textbox', { name: /Note to the reporter/ }).fill('Thanks: we are test-fitting the same coupler this week.');
  await card.getByRole('button', { name: 'Save note' }).click();
  await card.getByRole('button', { name: 'Save note' }).and(creatorPage.locator(':disabled')).waitFor();
  await shot(creatorPage, '06-workshop-investigating');

  // The creator confirms the check on the vehicle, with a measurement as its evidence.
  const before = await mailIds(reader.email);
  await confirmCheckWithReading(creatorApi, ids);

  // The reporter follows nothing, yet hears: they sent the report.
  const mail = await waitForMail(reader.email, new RegExp(`^Fit confirmed: ${checkTitle}$`), 20_000, before);
  assert.match(mail.text, /fit report/);
  assert.deepEqual(await apiClient(readerContext).get('/follows'), []);

  // The reporter's account lists the report: outcome, parts, the guide, status in words, the note, the check confirmed.
  await page.goto(`${baseUrl}/account`);
  const mine = page.getByRole('list', { name: 'My fit reports' }).getByTestId('my-fit-report').filter({ hasText: claimedParts });
  await mine.waitFor();
  assert.equal(await mine.getByTestId('report-outcome').textContent(), 'It fit');
  await mine.getByRole('link', { name: guideTitle }).waitFor();
  assert.match(await mine.getByTestId('report-status').textContent(), /^(Investigating: the workshop is looking into it|Verified by the workshop)$/);
  await mine.getByTestId('creator-note').filter({ hasText: 'we are test-fitting the same coupler this week' }).waitFor();
  await mine.getByTestId('report-check').getByTestId('check-state').filter({ hasText: 'Confirmed on the vehicle' }).waitFor();
  await mine.getByText(/· 1 photo$/).waitFor();
  await shot(page, '07-account');
  await creatorPage.close();
  await page.close();
});
