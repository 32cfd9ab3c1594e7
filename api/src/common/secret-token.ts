import { createHash, randomBytes, timingSafeEqual } from 'node:crypto';

/** A fresh unguessable token (256 bits, URL-safe) for cookies and e-mailed links. */
export function newSecretToken(): string {
  return randomBytes(32).toString('base64url');
}

/** What the database keeps instead of a token: its SHA-256, hex. */
export function hashSecretToken(token: string): string {
  return createHash('sha256').update(token, 'utf8').digest('hex');
}

/** Compares two strings in constant time (for tokens echoed back by the client). */
export function sameSecret(a: string, b: string): boolean {
  const left = Buffer.from(a, 'utf8');
  const right = Buffer.from(b, 'utf8');
  return left.length === right.length && timingSafeEqual(left, right);
}
