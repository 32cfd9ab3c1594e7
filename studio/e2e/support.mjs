// What the browser journeys share: the mail fake's inbox, the API through a browser context, and
// an account (with its workshop) made through the API where a journey is not about those screens.
import assert from 'node:assert/strict';
import { execFileSync } from 'node:child_process';
import { mkdtempSync, readFileSync, statSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { baseUrl } from './browser.mjs';

export const inboxUrl = process.env.MAIL_INBOX_URL ?? 'http://127.0.0.1:1090';

const addressedTo = (message, to) => message.to.some((recipient) => recipient.address.toLowerCase() === to);

/** The ids of the messages `to` already has (to wait for a newer one). */
export async function mailIds(to) {
  const messages = await (await fetch(`${inboxUrl}/email`)).json();
  return new Set(messages.filter((message) => addressedTo(message, to)).map((message) => message.id));
}

/** The newest message to `to` whose subject matches, read through the mail fake's REST API. */
export async function waitForMail(to, subject, timeoutMs = 20_000, excluding = new Set()) {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    const messages = await (await fetch(`${inboxUrl}/email`)).json();
    const found = messages.filter((message) => !excluding.has(message.id) && addressedTo(message, to) && subject.test(message.subject));
    if (found.length) return found[found.length - 1];
    await new Promise((resolve) => setTimeout(resolve, 200));
  }
  throw new Error(`no mail to ${to} matching ${subject}`);
}

/** The API through a browser context: its cookies, with the CSRF token echoed as the studio does. */
export function apiClient(context) {
  const csrf = () => context.cookies(baseUrl).then((cookies) => cookies.find((cookie) => cookie.name === 'fw_csrf')?.value);
  const send = (method) => async (path, data) => {
    const response = await context.request.fetch(`${baseUrl}/api${path}`, { method, data, headers: { 'X-CSRF-Token': (await csrf()) ?? '' } });
    assert.ok(response.ok(), `${method} ${path}: ${response.status()} ${await response.text()}`);
    return response.status() === 204 ? null : response.json();
  };
  return { get: send('GET'), post: send('POST'), put: send('PUT'), patch: send('PATCH'), delete: send('DELETE') };
}

/** Registers `person`, follows the e-mailed confirmation link and signs in, all through the API. */
export async function signUpThroughApi(context, person) {
  const api = apiClient(context);
  await context.request.get(`${baseUrl}/api/auth/me`);
  await api.post('/auth/register', person);
  const mail = await waitForMail(person.email, /Confirm your e-mail/);
  const token = new URL(mail.text.match(/https?:\/\/\S+verify-email\S*/)[0]).searchParams.get('token');
  await api.post('/auth/verify-email', { token });
  await api.post('/auth/login', { email: person.email, password: person.password });
  return api;
}

/** Mantine's Select (a textbox or combobox by its label), driven as a person would: open it and pick. */
export function field(scope, label) {
  return scope.getByRole('textbox', { name: label, exact: true }).or(scope.getByRole('combobox', { name: label, exact: true })).first();
}

export async function choose(scope, label, option) {
  await field(scope, label).click();
  await scope.page().getByRole('option', { name: option, exact: true }).click();
}

/**
 * Publishes (through `api`, a creator's client) a guide whose assembly holds one coupler with a pilot bore
 * and one manual fit check left open: what the follow and fit-report journeys start from.
 */
export async function publishGuideWithOpenCheck(api, { workshopName, workshopSlug, assemblyName, checkTitle, guideTitle }) {
  const workshop = await api.post('/workshops', { name: workshopName, slug: workshopSlug });
  const w = `/workshops/${workshop.id}`;
  const build = await api.post(`${w}/builds`, { title: 'Motor-to-gearbox coupler', vehicle: '1980s compact pickup, electric conversion' });
  const coupler = await api.post(`${w}/parts`, {
    partNumber: 'HL-2107',
    maker: 'Brackwater Drive',
    title: 'Coupler, 21-tooth',
    category: 'coupler',
    features: [{ name: 'pilot bore', kind: 'diameter', role: 'hole', nominal: '15', toleranceClass: 'H7', unit: 'mm' }],
  });
  const assembly = await api.post(`${w}/builds/${build.id}/assemblies`, { name: assemblyName });
  await api.put(`${w}/assemblies/${assembly.id}/parts/${coupler.id}`, { position: 'motor side' });
  const check = await api.post(`${w}/assemblies/${assembly.id}/checks`, { title: checkTitle, required: true });
  const guide = await api.post(`${w}/builds/${build.id}/guides`, { assemblyId: assembly.id, title: guideTitle, tools: ['Bore gauge'] });
  await api.post(`${w}/guides/${guide.id}/steps`, { title: 'Slide the coupler on', body: '<p>It should slide on <em>by hand</em>.</p>' });
  await api.post(`${w}/guides/${guide.id}/revisions`, { note: 'First edition' });
  return {
    workshopId: workshop.id,
    workshopSlug: workshop.slug,
    w,
    boreFeatureId: coupler.features.find((feature) => feature.name === 'pilot bore').id,
    assemblyId: assembly.id,
    checkId: check.id,
    guideSlug: guide.slug,
  };
}

/** The creator confirms the check on the vehicle, with a bore-gauge reading as its evidence. */
export async function confirmCheckWithReading(api, { w, boreFeatureId, checkId }) {
  const bore = await api.post(`${w}/measurements`, {
    featureId: boreFeatureId,
    quantity: 'diameter',
    value: '15.008',
    unit: 'mm',
    instrumentKind: 'bore_gauge',
    resolution: '0.001',
  });
  await api.post(`${w}/checks/${checkId}/evidence`, { kind: 'measurement', measurementId: bore.id });
  await api.post(`${w}/checks/${checkId}/transitions`, { to: 'confirmed', reason: 'Test-fitted on the vehicle' });
}

/** A 12 s small test pattern made on the spot; never real footage. */
export function makeClip() {
  const file = join(mkdtempSync(join(tmpdir(), 'fitwright-guide-view-')), 'coupler-test-fit.mp4');
  execFileSync('ffmpeg', [
    '-v', 'error', '-y',
    '-f', 'lavfi', '-i', 'testsrc2=duration=12:size=640x360:rate=25',
    '-c:v', 'libx264', '-preset', 'ultrafast', '-pix_fmt', 'yuv420p', '-movflags', '+faststart', file,
  ]);
  return file;
}

/** The studio's upload path, driven from the test: create, presigned part PUTs, record each ETag, complete. */
export async function uploadClip(api, workshopId, buildId, file, { fileName = 'coupler-test-fit.mp4', contentType = 'video/mp4' } = {}) {
  const bytes = readFileSync(file);
  const created = await api.post(`/workshops/${workshopId}/builds/${buildId}/footage`, {
    fileName,
    contentType,
    sizeBytes: statSync(file).size,
  });
  const footageId = created.footage.id;
  const { partSizeBytes, partCount } = created.upload;
  const partNumbers = Array.from({ length: partCount }, (_, index) => index + 1);
  const { urls } = await api.post(`/workshops/${workshopId}/footage/${footageId}/upload/part-urls`, { partNumbers });
  for (const { partNumber, url } of urls) {
    const put = await fetch(url, { method: 'PUT', body: bytes.subarray((partNumber - 1) * partSizeBytes, partNumber * partSizeBytes) });
    assert.ok(put.ok, `storage answered ${put.status} to part ${partNumber}`);
    await api.put(`/workshops/${workshopId}/footage/${footageId}/upload/parts/${partNumber}`, { etag: put.headers.get('etag') });
  }
  await api.post(`/workshops/${workshopId}/footage/${footageId}/upload/complete`);
  for (let attempt = 0; ; attempt += 1) {
    const footage = await api.get(`/workshops/${workshopId}/footage/${footageId}`);
    if (footage.state === 'ready') return footageId;
    assert.ok(footage.state === 'processing' && attempt < 150, `footage ${footage.state}: ${footage.failureReason}`);
    await new Promise((resolve) => setTimeout(resolve, 200));
  }
}
