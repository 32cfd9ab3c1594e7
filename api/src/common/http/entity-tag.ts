import { createHash } from 'node:crypto';
import type { IncomingHttpHeaders } from 'node:http';
import type { Request, Response } from 'express';

/**
 * A strong entity tag (RFC 9110 §8.8.3) naming the state an answer is built from, not its bytes,
 * so it can be known before the answer is built: equal state gives an equal tag.
 */
export function entityTagOf(state: unknown): string {
  return `"${createHash('sha256').update(JSON.stringify(state)).digest('base64url').slice(0, 32)}"`;
}

const NO_CACHE = /(?:^|,)\s*no-cache\s*(?:,|$)/i;
// Spaces only, as `fresh` trims them: a tab stays part of a tag there, so it must here.
const LIST_SEPARATOR = / *, */;
const EDGE_SPACES = /^ +| +$/g;

/**
 * Whether a GET may be answered 304 for this tag: `If-None-Match` lists it (weak comparison, RFC 9110
 * §13.1.2) or is `*`. Follows Express's own freshness rule (the `fresh` package) on purpose: a handler
 * that returns nothing for a match relies on Express's `res.send()` turning it into the 304, so whatever
 * `fresh` would not match (Cache-Control: no-cache, a list it splits differently) must not match here either.
 */
export function matchesIfNoneMatch(headers: IncomingHttpHeaders, entityTag: string): boolean {
  const ifNoneMatch = headers['if-none-match'];
  if (!ifNoneMatch) return false;
  const cacheControl = headers['cache-control'];
  if (cacheControl && NO_CACHE.test(cacheControl)) return false;
  if (ifNoneMatch === '*') return true;
  const opaque = stripWeakness(entityTag);
  return ifNoneMatch
    .replace(EDGE_SPACES, '')
    .split(LIST_SEPARATOR)
    .some((candidate) => stripWeakness(candidate) === opaque);
}

function stripWeakness(tag: string): string {
  return tag.startsWith('W/') ? tag.slice(2) : tag;
}

/**
 * A conditional GET (RFC 9110 §13.1.2) whose tag is known before the answer is built: sets `ETag`, and when
 * the request already holds it, answers nothing, which Express's `res.send()` sends as 304 (its `fresh` check
 * sees the same tag). With no tag (`null`: nothing to show) the answer is built as usual and kept by no cache,
 * so a 404 does not outlive a publication.
 */
export async function unlessNotModified<T>(
  request: Request,
  response: Response,
  entityTag: () => Promise<string | null>,
  build: () => Promise<T>,
): Promise<T | undefined> {
  // The tag is read before the answer: if the state moves in between, the tag is the older one, so the next
  // request gets the new answer rather than a 304 for a state the reader never saw.
  const tag = await entityTag();
  if (tag === null) {
    response.setHeader('Cache-Control', 'no-store');
    return build();
  }
  response.setHeader('ETag', tag);
  if (matchesIfNoneMatch(request.headers, tag)) return undefined;
  return build();
}
