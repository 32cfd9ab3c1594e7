import { pauseAfterFailures, pauseSchedule, SIGN_IN_LOCKOUT } from './sign-in-lockout';

describe('sign-in slow-down per account', () => {
  it('lets a few failures pass, then pauses 30 s, doubling each time', () => {
    // Our own rule; OWASP ASVS 4.0 V2.2.1 asks for anti-automation without a hard lock-out.
    expect([1, 2, 3, 4].map((n) => pauseAfterFailures(n))).toEqual([0, 0, 0, 0]);
    expect([5, 6, 7, 8, 9].map((n) => pauseAfterFailures(n))).toEqual([30_000, 60_000, 120_000, 240_000, 480_000]);
  });

  it('never pauses the owner for more than 15 minutes', () => {
    expect(pauseAfterFailures(10)).toBe(15 * 60_000);
    expect(pauseAfterFailures(1_000)).toBe(15 * 60_000);
    expect(SIGN_IN_LOCKOUT.windowMs).toBeLessThanOrEqual(15 * 60_000);
  });

  it('keeps guessing well under ASVS V2.2.1’s 100 failures an hour per account', () => {
    // Over one hour the attacker gets the free failures, then one try per pause.
    let elapsed = 0;
    let failures = 0;
    while (elapsed < 3_600_000) {
      failures += 1;
      elapsed += pauseAfterFailures(failures);
    }
    expect(failures).toBeLessThan(100);
    expect(failures).toBeLessThanOrEqual(15);
  });

  it('lists the pauses up to the cap, for the Redis script', () => {
    expect(pauseSchedule()).toEqual([0, 0, 0, 0, 30_000, 60_000, 120_000, 240_000, 480_000, 900_000]);
  });
});
