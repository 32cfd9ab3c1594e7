/**
 * A step's moment in the video as people type it: "m:ss", "m:ss.s", "h:mm:ss(.s)" or plain seconds
 * ("75", "75.5"). Shown as m:ss.s (tenths, like marks), with hours only past the hour.
 */

/** The time in whole milliseconds; `null` for an empty field; `undefined` when the text cannot be read. */
export function parseStepTime(text: string): number | null | undefined {
  const value = text.trim();
  if (value === '') return null;
  const clock = /^(?:(\d+):([0-5]\d):|(\d+):)?([0-5]?\d)(?:[.,](\d{1,3}))?$/.exec(value);
  const seconds = /^(\d+)(?:[.,](\d{1,3}))?$/.exec(value);
  if (seconds) return Number(seconds[1]) * 1000 + fraction(seconds[2]);
  if (!clock) return undefined;
  const [, hours, minutesAfterHours, minutes, wholeSeconds, part] = clock;
  // "1:5" is most likely a typo for 1:05 or 1:50; refuse it rather than guess.
  if (hours === undefined && minutes !== undefined && wholeSeconds.length !== 2) return undefined;
  if (hours !== undefined && wholeSeconds.length !== 2) return undefined;
  const totalMinutes = hours !== undefined ? Number(hours) * 60 + Number(minutesAfterHours) : Number(minutes ?? 0);
  return totalMinutes * 60_000 + Number(wholeSeconds) * 1000 + fraction(part);
}

function fraction(digits: string | undefined): number {
  return digits ? Math.round(Number(`0.${digits}`) * 1000) : 0;
}
