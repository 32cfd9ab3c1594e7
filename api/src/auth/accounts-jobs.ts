/** Jobs on the accounts queue. */
export const ACCOUNTS_JOBS = {
  /** Someone asked for a password reset link: look the address up and mail a link if it has an enabled account. */
  passwordResetRequested: 'password-reset-requested',
} as const;

export interface PasswordResetRequestedJob {
  /** Normalised (trimmed, lower-cased) address as typed; it may have no account. */
  email: string;
}
