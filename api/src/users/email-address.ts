/** One spelling per address: trimmed and lower-cased, so sign-up and sign-in agree. */
export function normalizeEmail(email: string): string {
  return email.trim().toLowerCase();
}
