/**
 * How failed sign-ins to one account slow further tries (OWASP ASVS 4.0 V2.2.1: anti-automation that stops
 * guessing without locking the owner out for long). The first few failures cost nothing; from then on each
 * failure pauses the account's sign-in for twice as long as the one before, capped at 15 minutes. Failures are
 * forgotten 15 minutes after the last one, and a successful sign-in forgets them at once.
 */
export interface SignInLockoutPolicy {
  /** Failures allowed before the first pause. */
  freeFailures: number;
  firstPauseMs: number;
  longestPauseMs: number;
  /** How long a failure is remembered after the latest one. */
  windowMs: number;
}

export const SIGN_IN_LOCKOUT: SignInLockoutPolicy = {
  freeFailures: 4,
  firstPauseMs: 30_000,
  longestPauseMs: 15 * 60_000,
  windowMs: 15 * 60_000,
};

/** The pause after the n-th remembered failure (n from 1). */
export function pauseAfterFailures(failures: number, policy: SignInLockoutPolicy = SIGN_IN_LOCKOUT): number {
  if (failures <= policy.freeFailures) return 0;
  const doublings = failures - policy.freeFailures - 1;
  return Math.min(policy.longestPauseMs, policy.firstPauseMs * 2 ** Math.min(doublings, 30));
}

/**
 * The pauses for the 1st, 2nd, … failure up to the first capped one, which also stands for every later failure;
 * the Redis script looks the pause up here, so the rule lives in this one place.
 */
export function pauseSchedule(policy: SignInLockoutPolicy = SIGN_IN_LOCKOUT): number[] {
  const schedule: number[] = [];
  for (let failures = 1; ; failures += 1) {
    const pause = pauseAfterFailures(failures, policy);
    schedule.push(pause);
    if (pause >= policy.longestPauseMs) return schedule;
  }
}
