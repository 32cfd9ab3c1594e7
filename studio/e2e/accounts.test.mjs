// Accounts journey: sign up, confirm from the real mail fake, sign in, create a workshop, invite a second
// person who signs up and accepts; a non-member sees "not found"; a signed-out visitor is sent to sign in and back.
import assert from 'node:assert/strict';
import { mkdirSync } from 'node:fs';
import { after, before, test } from 'node:test';
import { baseUrl, launchBrowser } from './browser.mjs';
import { mailIds, waitForMail } from './support.mjs';

const screenshots = new URL('./screenshots/', import.meta.url);
mkdirSync(screenshots, { recursive: true });
const shot = (page, name) => page.screenshot({ path: new URL(`accounts-${name}.png`, screenshots).pathname, fullPage: true });

const run = `${Date.now().toString(36)}${Math.floor(Math.random() * 1e4)}`;
const password = 'journey password 2026';
const creator = { name: 'Rowan Avery', email: `rowan-${run}@harrow-lane.example` };
const invitee = { name: 'Sam Okafor', email: `sam-${run}@harrow-lane.example` };
const stranger = { name: 'Ezra Quinn', email: `ezra-${run}@elsewhere.example` };
const workshopName = `Harrow Lane Garage ${run}`;

/** The link to `path` in the message, pointed at the app under test. */
function linkIn(message, path) {
  const link = (message.text.match(/https?:\/\/\S+/g) ?? []).map((url) => new URL(url)).find((url) => url.pathname === path);
  assert.ok(link, `a ${path} link in "${message.subject}"`);
  return new URL(`${link.pathname}${link.search}`, baseUrl).href;
}

let browser;
let workshopUrl;
before(async () => {
  browser = await launchBrowser();
});
after(async () => browser?.close());

async function newPage() {
  const context = await browser.newContext({ viewport: { width: 1280, height: 860 } });
  return context.newPage();
}

async function signUp(page, person) {
  await page.getByLabel('Your name').fill(person.name);
  const email = page.getByLabel('E-mail address');
  if ((await email.inputValue()) !== person.email) await email.fill(person.email);
  await page.getByRole('textbox', { name: 'Password' }).fill(password);
  await page.getByRole('button', { name: 'Create account' }).click();
  await page.getByText('Check your inbox').waitFor();
}

async function signIn(page, person) {
  await page.getByRole('heading', { name: 'Sign in' }).waitFor();
  await page.getByLabel('E-mail address').fill(person.email);
  await page.getByRole('textbox', { name: 'Password' }).fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
}

let creatorPage;

test('a new creator signs up, confirms the address from the inbox and signs in', async () => {
  creatorPage = await newPage();
  const page = creatorPage;
  await page.goto(baseUrl);
  await page.getByRole('link', { name: 'Create account' }).click();
  await page.getByRole('heading', { name: 'Create your account' }).waitFor();
  await signUp(page, creator);
  await shot(page, '01-signed-up');

  const mail = await waitForMail(creator.email, /Confirm your e-mail/);
  await page.goto(linkIn(mail, '/verify-email'));
  await page.getByText('Your e-mail address is confirmed').waitFor();
  await shot(page, '02-verified');

  await page.getByRole('link', { name: 'Sign in' }).last().click();
  await signIn(page, creator);
  await page.getByRole('heading', { name: 'My workshops' }).waitFor();
  await page.getByRole('button', { name: `Account menu for ${creator.name}` }).waitFor();
});

test('the creator creates a workshop and invites an editor by e-mail', async () => {
  const page = creatorPage;
  await page.getByLabel('Workshop name').fill(workshopName);
  assert.equal(await page.getByLabel('Web address').inputValue(), `harrow-lane-garage-${run}`);
  await page.getByLabel('Short description').fill('Electric conversion of a compact pickup, one verified fit at a time.');
  await shot(page, '03-create-workshop');
  await page.getByRole('button', { name: 'Create workshop' }).click();
  await page.getByRole('heading', { name: workshopName }).waitFor();
  workshopUrl = page.url();
  assert.match(workshopUrl, /\/workshops\/[0-9a-f-]{36}$/);
  await shot(page, '04-workshop-overview');

  await page.getByRole('tab', { name: 'Members' }).click();
  await page.getByRole('heading', { name: 'Invite someone' }).waitFor();
  await page.getByRole('form', { name: 'Invite a member' }).getByLabel('E-mail address').fill(invitee.email);
  await page.getByRole('button', { name: 'Send invitation' }).click();
  await page.getByRole('table', { name: 'Pending invitations' }).getByText(invitee.email).waitFor();
  await shot(page, '05-invited');
});

test('the invitee signs up from the invitation link and accepts it', async () => {
  const page = await newPage();
  const invitation = await waitForMail(invitee.email, /invited you/);
  assert.match(invitation.subject, new RegExp(`${creator.name} invited you to ${workshopName}`));
  await page.goto(linkIn(invitation, '/invitations/accept'));
  await page.getByText(`to join ${workshopName} as an editor`, { exact: false }).waitFor();
  await shot(page, '06-invitation-signed-out');

  await page.getByRole('link', { name: 'Create an account' }).first().click();
  await page.getByRole('heading', { name: 'Create your account' }).waitFor();
  assert.equal(await page.getByLabel('E-mail address').inputValue(), invitee.email);
  await signUp(page, invitee);
  await page.getByRole('link', { name: 'Go to sign in' }).click();
  await signIn(page, invitee);

  // Back on the invitation, signed in with the invited address.
  await page.getByRole('button', { name: 'Accept and open the workshop' }).click();
  await page.getByRole('heading', { name: workshopName }).waitFor();
  await page.getByText('Editor', { exact: true }).waitFor();
  await shot(page, '07-invitee-joined');

  await creatorPage.reload();
  const row = creatorPage.getByTestId(`member-${invitee.email}`);
  await row.waitFor();
  assert.ok((await row.textContent()).includes(invitee.name));
  await shot(creatorPage, '08-members');
});

test('someone who is not a member sees the workshop as not found', async () => {
  const page = await newPage();
  await page.goto(`${baseUrl}/sign-up`);
  await signUp(page, stranger);
  const mail = await waitForMail(stranger.email, /Confirm your e-mail/);
  await page.goto(linkIn(mail, '/verify-email'));
  await page.getByText('Your e-mail address is confirmed').waitFor();
  await page.goto(`${baseUrl}/sign-in`);
  await signIn(page, stranger);
  await page.getByRole('heading', { name: 'My workshops' }).waitFor();

  await page.goto(`${workshopUrl}/members`);
  await page.getByRole('heading', { name: 'Workshop not found' }).waitFor();
  assert.equal(await page.getByText(invitee.email).count(), 0);
  const api = await page.evaluate(async (url) => (await fetch(url)).status, workshopUrl.replace('/workshops/', '/api/workshops/'));
  assert.equal(api, 404);
  await shot(page, '09-non-member-not-found');
});

test('a signed-out visitor opening a creator page is sent to sign in and back', async () => {
  const page = await newPage();
  await page.goto(`${workshopUrl}/settings`);
  await page.waitForURL(/\/sign-in\?next=/);
  await shot(page, '10-sign-in-to-continue');
  await signIn(page, creator);
  await page.waitForURL(`${workshopUrl}/settings`);
  await page.getByRole('heading', { name: 'Details' }).waitFor();
  await shot(page, '11-back-to-settings');
});

test('the site admin (named in ADMIN_EMAILS) finds and disables an account', async () => {
  const admin = { name: 'Morgan Hale', email: 'journey-admin@fitwright.test' };
  const page = await newPage();
  const earlier = await mailIds(admin.email);
  await page.goto(`${baseUrl}/sign-up`);
  await signUp(page, admin);
  // A database kept from an earlier run already has this account: then the owner is told someone tried to sign up instead.
  const mail = await waitForMail(admin.email, /Confirm your e-mail|tried to sign up/, 30_000, earlier);
  if (/Confirm your e-mail/.test(mail.subject)) {
    await page.goto(linkIn(mail, '/verify-email'));
    await page.getByText('Your e-mail address is confirmed').waitFor();
  }
  await page.goto(`${baseUrl}/sign-in`);
  await signIn(page, admin);
  await page.getByRole('heading', { name: 'My workshops' }).waitFor();

  await page.getByRole('button', { name: `Account menu for ${admin.name}` }).click();
  await page.getByRole('menuitem', { name: 'Site administration' }).waitFor();
  await shot(page, '12-account-menu');
  await page.getByRole('menuitem', { name: 'Site administration' }).click();

  await page.getByLabel('Search users').fill(stranger.email);
  const row = page.getByRole('row', { name: new RegExp(stranger.email.replace(/[.+]/g, '\\$&')) });
  await row.waitFor().catch(async (error) => {
    await shot(page, '13-admin-users-failed');
    throw error;
  });
  page.once('dialog', (dialog) => dialog.accept());
  await row.getByRole('button', { name: 'Disable' }).click();
  await row.getByText('disabled').waitFor();
  await shot(page, '13-admin-users');

  await page.getByRole('tab', { name: 'Workshops' }).click();
  await page.getByLabel('Search workshops').fill(workshopName);
  await page.getByRole('row', { name: new RegExp(workshopName) }).waitFor();
  await shot(page, '14-admin-workshops');

  // The disabled account can no longer sign in.
  const refused = await page.evaluate(
    async ({ email, password: secret }) => {
      const csrf = document.cookie.match(/fw_csrf=([^;]+)/)?.[1] ?? '';
      const response = await fetch('/api/auth/login', {
        method: 'POST',
        headers: { 'Content-Type': 'application/json', 'X-CSRF-Token': csrf },
        body: JSON.stringify({ email, password: secret }),
      });
      return response.status;
    },
    { email: stranger.email, password },
  );
  assert.equal(refused, 403);
});
