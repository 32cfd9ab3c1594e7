import { describe, expect, it } from 'vitest';
import { formatDate, formatDateTime } from './dates';

describe('dates', () => {
  const iso = '2026-12-04T15:30:00.000Z';

  it('writes dates in the reader’s locale, as Intl.DateTimeFormat does for that locale', () => {
    expect(formatDate(iso)).toBe(new Intl.DateTimeFormat(undefined, { dateStyle: 'medium' }).format(new Date(iso)));
    expect(formatDate(new Date(iso))).toBe(formatDate(iso));
    expect(formatDate(iso)).toMatch(/2026/);
  });

  it('adds the time of day where asked', () => {
    expect(formatDateTime(iso)).toBe(new Intl.DateTimeFormat(undefined, { dateStyle: 'medium', timeStyle: 'short' }).format(new Date(iso)));
    expect(formatDateTime(iso).length).toBeGreaterThan(formatDate(iso).length);
  });
});
