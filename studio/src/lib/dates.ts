/**
 * Dates as the reader writes them: the browser's locale through Intl.DateTimeFormat, one helper for the
 * whole studio. Accepts the API's ISO strings or Date objects.
 */
const DATE = new Intl.DateTimeFormat(undefined, { dateStyle: 'medium' });
const DATE_TIME = new Intl.DateTimeFormat(undefined, { dateStyle: 'medium', timeStyle: 'short' });

/** "4 Dec 2026" (en-GB), "Dec 4, 2026" (en-US)… */
export function formatDate(value: string | Date): string {
  return DATE.format(typeof value === 'string' ? new Date(value) : value);
}

/** The date and the time of day, for things that happen several times a day (publishing, history). */
export function formatDateTime(value: string | Date): string {
  return DATE_TIME.format(typeof value === 'string' ? new Date(value) : value);
}
