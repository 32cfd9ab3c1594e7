import { EngineError } from './engine-error';

export const DIGEST_CADENCES = ['daily', 'weekly'] as const;
export type DigestCadence = (typeof DIGEST_CADENCES)[number];

export interface DigestSchedule {
  cadence: DigestCadence;
  /** IANA time zone, e.g. "Europe/Berlin". */
  timeZone: string;
  /** Local hour 0–23 the digest goes out at. */
  hour: number;
  /** For weekly digests: 0 = Sunday … 6 = Saturday, local. */
  weekday: number;
}

interface LocalParts {
  year: number;
  month: number;
  day: number;
  hour: number;
  minute: number;
  second: number;
  weekday: number;
}

const WEEKDAYS = ['Sun', 'Mon', 'Tue', 'Wed', 'Thu', 'Fri', 'Sat'];
const formatters = new Map<string, Intl.DateTimeFormat>();

/** Whether the runtime knows this IANA zone name. */
export function isTimeZone(name: string): boolean {
  try {
    new Intl.DateTimeFormat('en-US', { timeZone: name });
    return name.length > 0;
  } catch {
    return false;
  }
}

function formatterFor(timeZone: string): Intl.DateTimeFormat {
  let formatter = formatters.get(timeZone);
  if (!formatter) {
    if (!isTimeZone(timeZone)) throw new EngineError(`timeZone: "${timeZone}" is not an IANA time zone`, 'invalid_time_zone');
    formatter = new Intl.DateTimeFormat('en-US', {
      timeZone,
      hourCycle: 'h23',
      year: 'numeric',
      month: 'numeric',
      day: 'numeric',
      hour: 'numeric',
      minute: 'numeric',
      second: 'numeric',
      weekday: 'short',
    });
    formatters.set(timeZone, formatter);
  }
  return formatter;
}

function localParts(instant: Date, timeZone: string): LocalParts {
  const parts = Object.fromEntries(formatterFor(timeZone).formatToParts(instant).map((part) => [part.type, part.value]));
  return {
    year: Number(parts.year),
    month: Number(parts.month),
    day: Number(parts.day),
    hour: Number(parts.hour),
    minute: Number(parts.minute),
    second: Number(parts.second),
    weekday: WEEKDAYS.indexOf(parts.weekday),
  };
}

/** The zone's offset from UTC at an instant, in ms (local = UTC + offset). */
function offsetAt(instant: number, timeZone: string): number {
  const local = localParts(new Date(instant), timeZone);
  return Date.UTC(local.year, local.month - 1, local.day, local.hour, local.minute, local.second) - Math.floor(instant / 1000) * 1000;
}

/**
 * The instant a local wall-clock time happens in a zone. A time the clocks skip (spring forward) is
 * taken at the same distance after the jump, as a clock that was not moved would show it; a time
 * that happens twice (fall back) is its first occurrence.
 */
export function instantOfLocalTime(year: number, month: number, day: number, hour: number, timeZone: string): Date {
  const wall = Date.UTC(year, month - 1, day, hour);
  // Offsets before and after the wall time cover both sides of a change on that day.
  const candidates = [offsetAt(wall - 86_400_000, timeZone), offsetAt(wall + 86_400_000, timeZone)].map((offset) => wall - offset);
  const exact = candidates.filter((instant) => offsetAt(instant, timeZone) === wall - instant).sort((a, b) => a - b);
  return new Date(exact.length ? exact[0] : Math.max(...candidates));
}

/**
 * The latest moment a digest on this schedule fell due at or before `now`: today's (or the last
 * matching weekday's) local hour, in the person's zone, across daylight-saving changes.
 */
export function lastDigestDue(now: Date, schedule: DigestSchedule): Date {
  if (!Number.isInteger(schedule.hour) || schedule.hour < 0 || schedule.hour > 23) throw new EngineError('hour: a whole hour from 0 to 23', 'invalid_hour');
  if (!Number.isInteger(schedule.weekday) || schedule.weekday < 0 || schedule.weekday > 6) throw new EngineError('weekday: 0 (Sunday) to 6 (Saturday)', 'invalid_weekday');
  const today = localParts(now, schedule.timeZone);
  // Walk back day by day (at most 8) from the local date of `now` to the first due moment not after it.
  for (let back = 0; back <= 8; back += 1) {
    const date = new Date(Date.UTC(today.year, today.month - 1, today.day - back));
    if (schedule.cadence === 'weekly' && date.getUTCDay() !== schedule.weekday) continue;
    const due = instantOfLocalTime(date.getUTCFullYear(), date.getUTCMonth() + 1, date.getUTCDate(), schedule.hour, schedule.timeZone);
    if (due.getTime() <= now.getTime()) return due;
  }
  throw new EngineError('no digest time found in the last 8 days', 'no_digest_time');
}
