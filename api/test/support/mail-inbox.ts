/**
 * Reads the mail fake's inbox through its REST API (maildev 2: `GET /email`), at MAIL_INBOX_URL
 * (set by scripts/env.sh). Mail is sent by a Bull job, so a test waits for it rather than expecting it at once.
 */

export interface InboxMessage {
  id: string;
  subject: string;
  text: string;
  html?: string;
  /** As the fake received them, names in lower case. */
  headers?: Record<string, string>;
  to: { address: string; name?: string }[];
  /** When it was sent (whole seconds). */
  time: string;
}

function inboxUrl(): string {
  const url = process.env.MAIL_INBOX_URL;
  if (!url) throw new Error('MAIL_INBOX_URL is not set: run the tests through npm test or with scripts/env.sh loaded');
  return url.replace(/\/$/, '');
}

export async function listMail(): Promise<InboxMessage[]> {
  const response = await fetch(`${inboxUrl()}/email`);
  if (!response.ok) throw new Error(`mail fake answered ${response.status}`);
  return (await response.json()) as InboxMessage[];
}

export interface WaitForMailOptions {
  /** Only messages whose subject matches. */
  subject?: RegExp | string;
  /** Skip these messages: pass `await inboxSnapshot(to)` taken before the action that sends. */
  excluding?: ReadonlySet<string>;
  /** Default 20 s: a retried job (after an SMTP hiccup) backs off a few seconds. */
  timeoutMs?: number;
}

/** The newest message to `to` (case-insensitive) that matches; throws after the timeout, listing what arrived. */
export async function waitForMail(to: string, options: WaitForMailOptions = {}): Promise<InboxMessage> {
  const address = to.toLowerCase();
  const deadline = Date.now() + (options.timeoutMs ?? 20_000);
  const matches = (message: InboxMessage) =>
    message.to.some((recipient) => recipient.address.toLowerCase() === address) &&
    (options.subject === undefined ||
      (typeof options.subject === 'string' ? message.subject.includes(options.subject) : options.subject.test(message.subject))) &&
    !options.excluding?.has(message.id);
  let seen: InboxMessage[] = [];
  while (Date.now() < deadline) {
    seen = (await listMail()).filter((message) => message.to.some((recipient) => recipient.address.toLowerCase() === address));
    // The fake lists messages in the order they arrived: the last match is the newest.
    const found = seen.filter(matches);
    if (found.length > 0) return found[found.length - 1];
    await new Promise((resolve) => setTimeout(resolve, 150));
  }
  const subjects = seen.map((message) => `"${message.subject}"`).join(', ') || 'nothing';
  throw new Error(`no mail to ${to} matching ${String(options.subject ?? 'any subject')} arrived; got ${subjects}`);
}

/** The ids of the messages `to` has now, to ignore them when waiting for the next one. */
export async function inboxSnapshot(to: string): Promise<Set<string>> {
  const address = to.toLowerCase();
  const messages = await listMail();
  return new Set(
    messages.filter((message) => message.to.some((recipient) => recipient.address.toLowerCase() === address)).map((message) => message.id),
  );
}

/** The first link in the message's text whose path starts with `pathPrefix` (e.g. '/verify-email'). */
export function linkFrom(message: InboxMessage, pathPrefix = '/'): URL {
  for (const candidate of message.text.match(/https?:\/\/[^\s<>"]+/g) ?? []) {
    const url = new URL(candidate);
    if (url.pathname.startsWith(pathPrefix)) return url;
  }
  throw new Error(`no link to ${pathPrefix} in "${message.subject}":\n${message.text}`);
}

/** The `token` query parameter of that link. */
export function tokenFrom(message: InboxMessage, pathPrefix: string): string {
  const token = linkFrom(message, pathPrefix).searchParams.get('token');
  if (!token) throw new Error(`the ${pathPrefix} link in "${message.subject}" has no token`);
  return token;
}
