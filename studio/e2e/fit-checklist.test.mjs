// Fit checklist journey: a signed-in creator records a build, its parts and their features, takes readings,
// builds an assembly with three interfaces, reads the checklist (states, both diagrams), confirms a check
// with evidence, and a signed-out visitor uses the public fit calculator.
import assert from 'node:assert/strict';
import { mkdirSync } from 'node:fs';
import { after, before, test } from 'node:test';
import { baseUrl, launchBrowser } from './browser.mjs';
import { choose, field, signUpThroughApi } from './support.mjs';

const screenshots = new URL('./screenshots/', import.meta.url);
mkdirSync(screenshots, { recursive: true });
// Whole pages, except while a dialog, drawer or notification floats over them (a full-page capture misplaces those).
const shot = (page, name, { fullPage = true } = {}) =>
  page.screenshot({ path: new URL(`fit-${name}.png`, screenshots).pathname, fullPage });

const run = `${Date.now().toString(36)}${Math.floor(Math.random() * 1e4)}`;
const person = { displayName: 'Rowan Avery', email: `rowan-fit-${run}@harrow-lane.example`, password: 'journey password 2026' };

/** Account and workshop through the API (the accounts journey covers those screens); the rest is done on screen. */
async function signUpAndCreateWorkshop(context) {
  const api = await signUpThroughApi(context, person);
  const workshop = await api.post('/workshops', { name: `Harrow Lane Garage ${run}`, slug: `harrow-fit-${run}` });
  return workshop.id;
}

// Mantine's SegmentedControl, driven as a person would: click the segment's label.
async function segment(scope, text) {
  const exactly = new RegExp(`^${text.replace(/[()]/g, '\\$&')}$`);
  await scope.locator('label').filter({ hasText: exactly }).first().click();
}

let browser;
let page;
let workshopId;
let assemblyUrl;

before(async () => {
  browser = await launchBrowser();
  const context = await browser.newContext({ viewport: { width: 1280, height: 900 } });
  workshopId = await signUpAndCreateWorkshop(context);
  page = await context.newPage();
});
after(async () => browser?.close());

test('the creator opens a build', async () => {
  await page.goto(`${baseUrl}/workshops/${workshopId}/builds`);
  await page.getByText('No builds yet').waitFor();
  await page.getByRole('button', { name: 'New build' }).click();
  const form = page.getByRole('form', { name: 'New build' });
  await form.getByLabel('Title').fill('Motor-to-gearbox coupler');
  await form.getByLabel('Vehicle').fill('1980s compact pickup, electric conversion');
  await form.getByLabel('Goal').fill('Couple the motor shaft to the original gearbox input without re-machining.');
  await form.getByRole('button', { name: 'Create build' }).click();
  await page.getByRole('heading', { name: 'Motor-to-gearbox coupler' }).waitFor();
  await page.getByText('No assemblies yet').waitFor();
  await shot(page, '00-build');
});

/** Creates a part on the parts page and lands on its page. */
async function createPart({ partNumber, maker, title, category }) {
  await page.goto(`${baseUrl}/workshops/${workshopId}/parts`);
  await page.getByRole('button', { name: 'New part' }).click();
  const form = page.getByRole('form', { name: 'Create part' });
  await form.getByLabel('Part number').fill(partNumber);
  await form.getByLabel('Maker').fill(maker);
  await form.getByLabel('Title').fill(title);
  await choose(form, 'Category', category);
  await form.getByRole('button', { name: 'Create part' }).click();
  await page.getByRole('heading', { name: new RegExp(title) }).waitFor();
}

/** Adds a feature on the part page through the kind-dependent form. */
async function addFeature(name, kind, fill, screenshot) {
  await page.getByRole('button', { name: 'Add feature' }).first().click();
  const form = page.getByRole('form', { name: 'New feature' });
  await field(form, 'Name').fill(name);
  await segment(form, kind);
  await fill(form);
  if (screenshot) await shot(page, screenshot, { fullPage: false });
  await form.getByRole('button', { name: 'Add feature' }).click();
  await form.waitFor({ state: 'detached' });
  await page.getByLabel(`Feature ${name}`).waitFor();
}

async function addReading(featureName, { value, unit, instrument, resolution }, screenshot) {
  const readings = page.getByRole('region', { name: `Readings of ${featureName}` });
  await readings.getByRole('button', { name: 'Add reading' }).click();
  const form = readings.getByRole('form', { name: 'New reading' });
  await form.getByRole('textbox', { name: 'Reading' }).fill(value);
  if (unit) await choose(form, 'Unit', unit);
  await choose(form, 'Instrument', instrument);
  await form.getByRole('textbox', { name: 'Resolution' }).fill(resolution);
  await field(form, 'Temperature (°C)').fill('20');
  if (screenshot) await shot(page, screenshot);
  await form.getByRole('button', { name: 'Save reading' }).click();
  await readings.getByRole('cell', { name: `${value} ${unit ?? 'mm'}` }).first().waitFor();
}

test('the creator records three parts with their features, and readings of the pilot fit', async () => {
  await createPart({ partNumber: 'HL-2107', maker: 'Brackwater Driveline', title: '21-tooth motor coupler', category: 'Coupler' });
  await addFeature('output spline', 'Spline', async (form) => {
    await field(form, 'Teeth').fill('21');
    await segment(form, 'Internal (hub)');
    await segment(form, 'Diametral pitch');
    await field(form, 'Diametral pitch').fill('16');
    await field(form, 'Stub pitch').fill('32');
  }, '01a-spline-feature-form');
  await addFeature('pilot bore', 'Diameter', async (form) => {
    await segment(form, 'Hole (bore)');
    await field(form, 'Nominal size').fill('15');
    await field(form, 'ISO 286 class').fill('H7');
  });
  await addReading('pilot bore', { value: '15.012', instrument: 'Bore gauge', resolution: '0.001' }, '01b-reading-form');
  await addReading('pilot bore', { value: '15.013', instrument: 'Bore gauge', resolution: '0.001' });
  const summary = page.getByRole('region', { name: 'Readings of pilot bore' }).getByTestId('readings-summary');
  // Mean (15.012 + 15.013) / 2 = 15.0125 mm, shown at the bore gauge's 0.001 mm (half rounds up); spread 15.013 − 15.012.
  assert.match(await summary.textContent(), /2 readings · mean 15\.013 mm · spread 0\.001 mm/);

  // The unit toggle converts each reading, keeping the bore gauge's resolution.
  const readings = page.getByRole('region', { name: 'Readings of pilot bore' });
  await readings.locator('label').filter({ hasText: /^in$/ }).click();
  // 15.012 mm ÷ 25.4 mm/in = 0.5910236 in, to 5 places (0.001 mm is 0.00004 in, so a 5th place is still meaningful).
  await readings.getByRole('cell', { name: '0.59102 in' }).waitFor();
  await page.waitForTimeout(300); // the toggle's marker slides across
  await shot(page, '01-part-with-readings');

  await createPart({ partNumber: 'GB-0421', maker: 'Old Ferry Gearworks', title: 'Gearbox input shaft', category: 'Shaft' });
  await addFeature('input spline', 'Spline', async (form) => {
    await field(form, 'Teeth').fill('21');
    await segment(form, 'External (shaft)');
    await segment(form, 'Diametral pitch');
    await field(form, 'Diametral pitch').fill('16');
    await field(form, 'Stub pitch').fill('32');
  });
  await addFeature('pilot journal', 'Diameter', async (form) => {
    await segment(form, 'Shaft');
    await field(form, 'Nominal size').fill('15');
    await field(form, 'ISO 286 class').fill('g6');
  });
  await addReading('pilot journal', { value: '14.990', instrument: 'Outside micrometer', resolution: '0.001' });

  await createPart({ partNumber: 'DS-540', maker: 'Kestrel Shafts', title: 'Long driveshaft', category: 'Shaft' });
  await addFeature('overall length', 'Length', async (form) => {
    await field(form, 'Overall length').fill('540');
    await field(form, 'Fully compressed').fill('520');
    await field(form, 'Fully extended').fill('565');
  });

  // The parts table finds a part by its number written loosely, and by spline tooth count.
  await page.goto(`${baseUrl}/workshops/${workshopId}/parts`);
  await page.getByLabel('Part number, title or maker').fill('hl 2107');
  await page.getByRole('table', { name: 'Parts' }).getByRole('link', { name: 'HL-2107' }).waitFor();
  await page.waitForFunction(() => document.querySelectorAll('table[aria-label="Parts"] tbody tr').length === 1);
  await page.getByLabel('Part number, title or maker').fill('');
  await page.getByRole('textbox', { name: 'Spline teeth' }).fill('21');
  await page.waitForFunction(() => document.querySelectorAll('table[aria-label="Parts"] tbody tr').length === 2);
  await shot(page, '02-parts-table');
});

test('the creator builds an assembly: places the parts and adds three interfaces', async () => {
  await page.goto(`${baseUrl}/workshops/${workshopId}/builds`);
  await page.getByRole('link', { name: 'Motor-to-gearbox coupler' }).click();
  await page.getByRole('button', { name: 'New assembly' }).click();
  const create = page.getByRole('form', { name: 'New assembly' });
  await create.getByLabel('Name').fill('21-tooth coupler with the long shaft');
  await create.getByRole('button', { name: 'Create assembly' }).click();
  await page.getByRole('heading', { name: '21-tooth coupler with the long shaft' }).waitFor();
  assemblyUrl = page.url().replace(/\?.*$/, '');
  await page.getByRole('tab', { name: 'Parts and interfaces' }).click();

  const place = page.getByRole('form', { name: 'Place a part' });
  for (const [part, position] of [
    ['HL-2107 · 21-tooth motor coupler', 'input side'],
    ['GB-0421 · Gearbox input shaft', 'output side'],
    ['DS-540 · Long driveshaft', 'shaft'],
  ]) {
    await choose(place, 'Part', part);
    await field(place, 'Position').fill(position);
    await page.keyboard.press('Escape');
    await place.getByRole('button', { name: 'Place part' }).click();
    await page.getByRole('table', { name: 'Placed parts' }).getByRole('cell', { name: position, exact: true }).waitFor();
  }

  const addInterface = async (kind, name, first, second, extra) => {
    await page.getByRole('button', { name: 'Add interface' }).click();
    const form = page.getByRole('form', { name: 'New interface' });
    await segment(form, kind);
    await field(form, 'Name').fill(name);
    // Feature choices read "<part> — <feature>": pick by the feature, whichever part it belongs to.
    const ofAnyPart = (feature) => new RegExp(` — ${feature.replace(/[.*+?^${}()|[\]\\]/g, '\\$&')}$`);
    await choose(form, kind === 'Length in an installed window' ? 'Length feature' : 'First feature', ofAnyPart(first));
    if (second) await choose(form, 'Mating feature', ofAnyPart(second));
    if (extra) await extra(form);
    await form.getByRole('button', { name: 'Add interface' }).click();
    await page.getByLabel(`Interface ${name}`).waitFor();
  };
  await addInterface('Spline to spline', 'coupler to gearbox input', 'output spline (21-tooth internal)', 'input spline (21-tooth external)');
  await addInterface('Bore and shaft', 'pilot bearing fit', 'pilot bore (hole ⌀ 15 H7)', 'pilot journal (shaft ⌀ 15 g6)');
  // The tunnel allows 530–562 mm: with 5 mm to keep at each end, the shaft has only 3 mm of extension left.
  await addInterface('Length in an installed window', 'driveshaft in the tunnel', 'overall length (520–565)', null, async (form) => {
    await field(form, 'Shortest installed length').fill('530');
    await field(form, 'Longest installed length').fill('562');
    await field(form, 'Travel to keep each way').fill('5');
  });
  await shot(page, '03-assembly-builder');
});

test('the checklist shows each state, the verdict and both diagrams', async () => {
  await page.getByRole('tab', { name: 'Checklist' }).click();
  const verdict = page.getByTestId('checklist-verdict');
  await verdict.waitFor();
  const card = (title) => page.getByLabel(`Check: ${title}`);
  await card('Spline match: coupler to gearbox input').getByText('Passes on the bench').waitFor();
  await card('Fit: pilot bearing fit').getByText('Passes on the bench').waitFor();
  await card('Length window: driveshaft in the tunnel').getByText('Does not fit').waitFor();
  assert.equal(await verdict.getAttribute('data-verdict'), 'no_fit');

  const zones = card('Fit: pilot bearing fit').getByTestId('tolerance-zone-diagram');
  await zones.waitFor();
  assert.equal(await zones.getByTestId('marker-hole').count(), 2);
  assert.equal(await zones.getByTestId('marker-shaft').count(), 1);
  assert.match(await zones.locator('title').first().textContent(), /Fit: pilot bearing fit/);
  const window = card('Length window: driveshaft in the tunnel').getByTestId('length-window-diagram');
  await window.waitFor();
  // Fully extended 565 mm − longest installed 562 mm = 3 mm, under the 5 mm the creator asked to keep.
  assert.equal(await window.getByTestId('extension-left').textContent(), '3 mm left');
  await card('Length window: driveshaft in the tunnel').getByText(/extension left at the longest installed length is 3 mm, less than the 5 mm margin/).waitFor();

  // The axis toggles to thou.
  await page.locator('label').filter({ hasText: /^thou$/ }).click();
  await zones.getByText(/Deviation from 15 mm, thou/).waitFor();
  await shot(page, '04-checklist');
  await zones.screenshot({ path: new URL('fit-05-tolerance-zones.png', screenshots).pathname });
  await window.screenshot({ path: new URL('fit-06-length-window.png', screenshots).pathname });
});

test('confirming needs evidence: refused without, done with a reading attached', async () => {
  // A manual check with no evidence cannot be confirmed: the API says why, in a notification.
  await page.getByRole('button', { name: 'Add a check by hand' }).click();
  const manual = page.getByRole('form', { name: 'New manual check' });
  await field(manual, 'Check').fill('Test-fitted on the vehicle: coupler engages fully');
  await manual.getByRole('button', { name: 'Add check' }).click();
  const handCheck = page.getByLabel('Check: Test-fitted on the vehicle: coupler engages fully');
  await handCheck.getByText('Open', { exact: true }).waitFor();
  await handCheck.getByRole('button', { name: 'Confirm…' }).click();
  let dialog = page.getByRole('dialog', { name: 'Confirm on the vehicle' });
  await dialog.getByLabel('Reason').fill('Bolted up with the motor; turns by hand.');
  await dialog.getByRole('button', { name: 'Confirm', exact: true }).click();
  await page.getByText('Attach evidence (a measurement, a mark or a photo) before confirming.').waitFor();
  await page.waitForTimeout(500); // the notification slides in
  await shot(page, '07-refused-without-evidence', { fullPage: false });
  await dialog.getByRole('button', { name: 'Cancel' }).click();

  // The pilot fit: attach the bore reading, then confirm.
  const fit = page.getByLabel('Check: Fit: pilot bearing fit');
  await fit.getByRole('button', { name: 'Attach a reading as evidence' }).click();
  await field(fit, 'Reading').click();
  await page.getByRole('option').filter({ hasText: '15.012 mm' }).first().click();
  await fit.getByRole('button', { name: 'Attach', exact: true }).click();
  await fit.getByTestId('evidence-list').getByText(/pilot bore on HL-2107: 15\.012 mm/).waitFor();
  await fit.getByRole('button', { name: 'Confirm…' }).click();
  dialog = page.getByRole('dialog', { name: 'Confirm on the vehicle' });
  await dialog.getByLabel('Reason').fill('Pilot bearing pressed in; the gearbox input turns freely in it.');
  await dialog.getByRole('button', { name: 'Confirm', exact: true }).click();
  await fit.getByText('Confirmed on the vehicle').waitFor();
  assert.equal(await fit.getAttribute('data-state'), 'confirmed');

  // What if the replacement journal were 0.002 mm larger?
  await fit.getByRole('button', { name: 'What if…' }).click();
  await fit.getByLabel('What if the shaft were larger by').fill('0.002');
  await fit.getByRole('button', { name: 'Work it out' }).click();
  const answer = await fit.getByTestId('what-if-answer').textContent();
  // Measured clearance: bore mean 15.0125 mm − journal 14.990 mm = 22.5 µm; 2 µm / 22.5 µm = 8.89 %.
  assert.match(answer, /takes 8\.9 % of the measured clearance/);

  // The history keeps every change with its reason (notifications closed first, so they do not cover it).
  for (const close of await page.locator('.mantine-Notification-closeButton').all()) await close.click();
  await fit.getByRole('button', { name: 'History' }).click();
  const history = page.getByRole('dialog', { name: /History: Fit: pilot bearing fit/ });
  await history.getByText('Pilot bearing pressed in; the gearbox input turns freely in it.').waitFor();
  // Let the drawer finish sliding in before the picture.
  await page.waitForTimeout(500);
  await shot(page, '08-confirmed-with-history', { fullPage: false });
  await page.keyboard.press('Escape');
  await history.waitFor({ state: 'hidden' });
  await shot(page, '09-checklist-after');
});

test('anyone can use the fit calculator from the navigation, signed in or not', async () => {
  const visitor = await browser.newContext({ viewport: { width: 1280, height: 900 } });
  const calculator = await visitor.newPage();
  await calculator.goto(baseUrl);
  await calculator.getByRole('navigation', { name: 'Main navigation' }).getByRole('link', { name: 'Fit calculator' }).click();
  await calculator.getByRole('heading', { name: 'Fit calculator' }).waitFor();
  await calculator.getByLabel('Nominal size').fill('25');
  await calculator.locator('label').filter({ hasText: 'H7/p6 locational interference' }).click();
  await calculator.getByTestId('fit-kind').getByText(/^Interference fit/).waitFor();
  assert.match(calculator.url(), /size=25&unit=mm&hole=H7&shaft=p6/);
  const limits = calculator.getByRole('table', { name: 'Limits' });
  // ISO 286-2, 18–30 mm: p6 = +35/+22 µm, so the largest shaft is 25 mm + 0.035 mm.
  await limits.getByText('25.035 mm').waitFor();
  await calculator.getByTestId('tolerance-zone-diagram').waitFor();
  await shot(calculator, '10-fit-calculator');
  await visitor.close();
});

test('the assembly page survives a reload with its checklist', async () => {
  await page.goto(assemblyUrl);
  await page.getByTestId('checklist-verdict').waitFor();
  assert.equal(await page.getByTestId('checklist-verdict').getAttribute('data-verdict'), 'no_fit');
  // On a phone the cards fit the screen; a diagram keeps a readable size and scrolls sideways inside its card.
  await page.setViewportSize({ width: 390, height: 844 });
  await page.getByTestId('tolerance-zone-diagram').waitFor();
  // The layout settles a moment after the resize (fonts, wrapping): wait up to five seconds for it, then judge.
  await page
    .waitForFunction(
      () => [...document.querySelectorAll('[data-testid="check-card"]')].every((card) => card.scrollWidth <= card.clientWidth + 1),
      null,
      { timeout: 5000 },
    )
    .catch(() => {});
  const cardsOverflow = await page
    .getByTestId('check-card')
    .evaluateAll((cards) => cards.filter((card) => card.scrollWidth > card.clientWidth + 1).length);
  assert.equal(cardsOverflow, 0, 'no check card is wider than the phone');
  const diagramWidth = await page.getByTestId('tolerance-zone-diagram').evaluate((svg) => svg.getBoundingClientRect().width);
  assert.ok(diagramWidth >= 480, `the tolerance diagram stays readable (${diagramWidth}px)`);
  await shot(page, '11-checklist-phone');
  await page.getByTestId('tolerance-zone-diagram').scrollIntoViewIfNeeded();
  await shot(page, '12-diagram-on-phone', { fullPage: false });
});
