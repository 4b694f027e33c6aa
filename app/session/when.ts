/** Times in the library: short where recent, with the full date and time in a tooltip. */

const TIME = new Intl.DateTimeFormat(undefined, { hour: 'numeric', minute: '2-digit' });
const DAY = new Intl.DateTimeFormat(undefined, { day: 'numeric', month: 'short' });
const DATE = new Intl.DateTimeFormat(undefined, { day: 'numeric', month: 'short', year: 'numeric' });
const FULL = new Intl.DateTimeFormat(undefined, { dateStyle: 'full', timeStyle: 'medium' });

/** "14:03" today, "2 Dec, 14:03" this year, "2 Dec 2025" before. */
export function shortWhen(ms: number, now = Date.now()): string {
  const d = new Date(ms);
  const today = new Date(now);
  if (d.toDateString() === today.toDateString()) return TIME.format(d);
  if (d.getFullYear() === today.getFullYear()) return `${DAY.format(d)}, ${TIME.format(d)}`;
  return DATE.format(d);
}

export function fullWhen(ms: number): string {
  return FULL.format(new Date(ms));
}

const DAY_MS = 86_400_000;

/** "30 days", "1 day", "less than a day": how long something is kept yet (a day begun counts). */
export function daysLeft(until: number, now = Date.now()): string {
  const left = until - now;
  if (left < DAY_MS) return 'less than a day';
  const days = Math.ceil(left / DAY_MS);
  return days === 1 ? '1 day' : `${days} days`;
}
