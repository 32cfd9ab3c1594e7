/** The httpOnly cookie that carries the session token. */
export const SESSION_COOKIE = 'fw_session';
/** The readable cookie the studio echoes in the `X-CSRF-Token` header (double-submit). */
export const CSRF_COOKIE = 'fw_csrf';
export const CSRF_HEADER = 'x-csrf-token';

/** Sessions slide: each request pushes expiry this far ahead (written at most once an hour). */
export const SESSION_TTL_MS = 14 * 24 * 3600 * 1000;
export const SESSION_REFRESH_AFTER_MS = 3600 * 1000;
/** However much it is used, a session ends this long after sign-in (then sign in again). */
export const SESSION_MAX_AGE_MS = 90 * 24 * 3600 * 1000;

export const EMAIL_TOKEN_TTL_MS = {
  'verify-email': 48 * 3600 * 1000,
  'reset-password': 3600 * 1000,
  'change-email': 24 * 3600 * 1000,
} as const;

export const PASSWORD_MIN_LENGTH = 10;
export const PASSWORD_MAX_LENGTH = 200;
