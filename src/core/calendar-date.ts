/**
 * Dates written YYYY-MM-DD (ISO 8601's calendar date, extended format): whether a text is one,
 * and whether it names a day that exists.
 */

/** What a text is as a date: a real day, a day that does not exist ("2027-02-30"), or not written YYYY-MM-DD. */
export type DateReading =
  | { readonly kind: 'date'; readonly year: number; readonly month: number; readonly day: number }
  | { readonly kind: 'not-real' }
  | { readonly kind: 'not-written' };

/**
 * Read a date written YYYY-MM-DD (spaces around it are ignored).
 *
 * @example readCalendarDate('2028-06-30') // => { kind: 'date', year: 2028, month: 6, day: 30 }
 * @example readCalendarDate('2027-02-29').kind // => 'not-real'
 * @example readCalendarDate('30/06/2028').kind // => 'not-written'
 */
export function readCalendarDate(text: string): DateReading {
  const found = /^(\d{4})-(\d{2})-(\d{2})$/.exec(text.trim());
  if (found === null) return { kind: 'not-written' };
  const [year, month, day] = [Number(found[1]), Number(found[2]), Number(found[3])];
  const calendar = new Date(Date.UTC(year, month - 1, day));
  calendar.setUTCFullYear(year);
  const real = calendar.getUTCFullYear() === year && calendar.getUTCMonth() === month - 1 && calendar.getUTCDate() === day;
  return real ? { kind: 'date', year, month, day } : { kind: 'not-real' };
}
