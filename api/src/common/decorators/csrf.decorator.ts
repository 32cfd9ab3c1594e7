import { SetMetadata } from '@nestjs/common';

export const REQUIRE_CSRF = 'fitwright:require-csrf';

/**
 * Marks a public form route (sign-in, sign-up, password reset…) as needing the CSRF token even when
 * the caller has no session yet. Every other state-changing request needs it whenever it carries a
 * session cookie or its rule is not `public`; see the access guard.
 */
export const RequireCsrf = () => SetMetadata(REQUIRE_CSRF, true);
