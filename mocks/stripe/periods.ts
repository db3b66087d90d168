export type BillingInterval = 'day' | 'week' | 'month' | 'year';

const DAY_SECONDS = 86_400;

function daysInMonthUtc(year: number, monthIndex: number): number {
  return new Date(Date.UTC(year, monthIndex + 1, 0)).getUTCDate();
}

/**
 * The end of a billing period that starts at `startSeconds`. Month and year steps keep the
 * time of day and clamp to the last day of a shorter month (31 Jan + 1 month = 28/29 Feb),
 * as calendar billing commonly does [cp].
 */
export function addInterval(startSeconds: number, interval: BillingInterval, count = 1): number {
  if (!Number.isInteger(count) || count < 1)
    throw new RangeError(`interval count must be a positive integer, got ${count}`);
  if (interval === 'day') return startSeconds + count * DAY_SECONDS;
  if (interval === 'week') return startSeconds + count * 7 * DAY_SECONDS;
  const start = new Date(startSeconds * 1000);
  const months = interval === 'month' ? count : count * 12;
  const targetMonth = start.getUTCMonth() + months;
  const year = start.getUTCFullYear() + Math.floor(targetMonth / 12);
  const monthIndex = ((targetMonth % 12) + 12) % 12;
  const day = Math.min(start.getUTCDate(), daysInMonthUtc(year, monthIndex));
  const end = Date.UTC(year, monthIndex, day, start.getUTCHours(), start.getUTCMinutes(), start.getUTCSeconds());
  return Math.floor(end / 1000);
}
