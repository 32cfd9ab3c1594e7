/**
 * Times in footage as one clock: "m:ss", or "h:mm:ss" once past the hour, optionally with tenths
 * ("m:ss.t", "h:mm:ss.t") where marks and steps are placed to a tenth of a second. The one place the
 * studio turns milliseconds into a clock, so the player, the marks and the guide always agree.
 * Time is cut, not rounded, so a moment never shows later than it is (as players show it).
 */
export function formatClock(ms: number, options: { tenths?: boolean } = {}): string {
  const tenths = Math.floor(Math.max(0, ms) / 100);
  const totalSeconds = Math.floor(tenths / 10);
  const hours = Math.floor(totalSeconds / 3600);
  const minutes = Math.floor(totalSeconds / 60) % 60;
  const seconds = String(totalSeconds % 60).padStart(2, '0');
  const clock = hours > 0 ? `${hours}:${String(minutes).padStart(2, '0')}:${seconds}` : `${minutes}:${seconds}`;
  return options.tenths ? `${clock}.${tenths % 10}` : clock;
}
