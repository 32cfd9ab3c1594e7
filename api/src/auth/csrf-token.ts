import { createHmac, randomBytes } from 'node:crypto';
import { hashSecretToken, sameSecret } from '../common/secret-token';

/**
 * Signed double-submit CSRF tokens: `<nonce>.<HMAC-SHA256(key, binding "." nonce)>`, where the binding is the
 * SHA-256 of the session token, or "anonymous" before sign-in. A token only verifies for the session it was
 * made for, so one planted from another session (or kept from before sign-in) is refused.
 */
const ANONYMOUS = 'anonymous';

function binding(sessionToken: string | undefined): string {
  return sessionToken === undefined ? ANONYMOUS : `session:${hashSecretToken(sessionToken)}`;
}

function signature(key: string, sessionToken: string | undefined, nonce: string): string {
  return createHmac('sha256', key).update(`${binding(sessionToken)}.${nonce}`, 'utf8').digest('base64url');
}

export function makeCsrfToken(key: string, sessionToken: string | undefined): string {
  const nonce = randomBytes(16).toString('base64url');
  return `${nonce}.${signature(key, sessionToken, nonce)}`;
}

export function csrfTokenFits(key: string, sessionToken: string | undefined, token: string): boolean {
  const dot = token.indexOf('.');
  if (dot <= 0) return false;
  const nonce = token.slice(0, dot);
  return sameSecret(token.slice(dot + 1), signature(key, sessionToken, nonce));
}
