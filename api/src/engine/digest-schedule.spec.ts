import { instantOfLocalTime, isTimeZone, lastDigestDue } from './digest-schedule';

// Zone offsets and daylight-saving dates from the IANA tz database (as shipped with Node's ICU):
// US Eastern: EST = UTC−5, EDT = UTC−4; 2026 clocks go forward Sun 8 Mar 02:00 and back Sun 1 Nov 02:00.
// Central Europe: CET = UTC+1, CEST = UTC+2; 2026 forward Sun 29 Mar 02:00, back Sun 25 Oct 03:00.

describe('lastDigestDue', () => {
  const daily = (timeZone: string, hour: number) => ({ cadence: 'daily' as const, timeZone, hour, weekday: 0 });

  it('gives today’s local hour once it has passed, else yesterday’s', () => {
    // 8:00 in New York in winter (EST) is 13:00 UTC.
    expect(lastDigestDue(new Date('2026-01-15T13:30:00Z'), daily('America/New_York', 8)).toISOString()).toBe('2026-01-15T13:00:00.000Z');
    expect(lastDigestDue(new Date('2026-01-15T12:59:59Z'), daily('America/New_York', 8)).toISOString()).toBe('2026-01-14T13:00:00.000Z');
  });

  it('keeps the local hour across the spring change (US Eastern, 8 Mar 2026): 13:00 UTC before, 12:00 UTC after', () => {
    expect(lastDigestDue(new Date('2026-03-07T20:00:00Z'), daily('America/New_York', 8)).toISOString()).toBe('2026-03-07T13:00:00.000Z');
    expect(lastDigestDue(new Date('2026-03-08T20:00:00Z'), daily('America/New_York', 8)).toISOString()).toBe('2026-03-08T12:00:00.000Z');
    // Between them: 23 hours, not 24 (the night was an hour short).
    const gap = lastDigestDue(new Date('2026-03-08T20:00:00Z'), daily('America/New_York', 8)).getTime() -
      lastDigestDue(new Date('2026-03-07T20:00:00Z'), daily('America/New_York', 8)).getTime();
    expect(gap).toBe(23 * 3_600_000);
  });

  it('keeps the local hour across the autumn change (Central Europe, 25 Oct 2026): 06:00 UTC before, 07:00 UTC after', () => {
    expect(lastDigestDue(new Date('2026-10-24T12:00:00Z'), daily('Europe/Berlin', 8)).toISOString()).toBe('2026-10-24T06:00:00.000Z');
    expect(lastDigestDue(new Date('2026-10-25T12:00:00Z'), daily('Europe/Berlin', 8)).toISOString()).toBe('2026-10-25T07:00:00.000Z');
  });

  it('a skipped hour (02:00 on the spring-forward night) is taken just after the jump; a repeated hour at its first time', () => {
    // New York, 8 Mar 2026: 02:00 EST does not exist; 03:00 EDT = 07:00 UTC.
    expect(instantOfLocalTime(2026, 3, 8, 2, 'America/New_York').toISOString()).toBe('2026-03-08T07:00:00.000Z');
    // New York, 1 Nov 2026: 01:00 happens twice, first as EDT (05:00 UTC).
    expect(instantOfLocalTime(2026, 11, 1, 1, 'America/New_York').toISOString()).toBe('2026-11-01T05:00:00.000Z');
  });

  it('weekly digests fall on the chosen local weekday', () => {
    // 2026-01-15 is a Thursday (ISO calendar); weekday 1 = Monday → Monday 12 Jan, 9:00 in Tokyo (UTC+9, no DST) = 00:00 UTC.
    const weekly = { cadence: 'weekly' as const, timeZone: 'Asia/Tokyo', hour: 9, weekday: 1 };
    expect(lastDigestDue(new Date('2026-01-15T00:00:00Z'), weekly).toISOString()).toBe('2026-01-12T00:00:00.000Z');
  });

  it('refuses unknown zones and hours outside 0–23, naming the field', () => {
    expect(isTimeZone('Mars/Olympus_Mons')).toBe(false);
    expect(() => lastDigestDue(new Date(), daily('Mars/Olympus_Mons', 8))).toThrow(/timeZone/);
    expect(() => lastDigestDue(new Date(), daily('UTC', 24))).toThrow(/hour/);
  });
});
