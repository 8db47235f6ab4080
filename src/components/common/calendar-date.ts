// Calendar days as the API takes them (YYYY-MM-DD) and as PrimeVue's
// DatePicker holds them (a Date at local midnight). Converting through
// toISOString() would shift the day for anyone east or west of UTC, so the
// local date parts are used on both sides.

const ISO_DATE = /^\d{4}-\d{2}-\d{2}$/;

/** A local calendar date as YYYY-MM-DD (a date picker's Date, without time zone shifts). */
export function toIsoDate(date: Date | null | undefined): string | null {
  if (!date || Number.isNaN(date.getTime())) return null;
  const pad = (n: number) => String(n).padStart(2, '0');
  return `${date.getFullYear()}-${pad(date.getMonth() + 1)}-${pad(date.getDate())}`;
}

/** The Date a date picker shows for YYYY-MM-DD (local midnight); null for anything else. */
export function fromIsoDate(text: string | null | undefined): Date | null {
  if (!text || !ISO_DATE.test(text)) return null;
  const [y, m, d] = text.split('-').map(Number);
  const date = new Date(y, m - 1, d);
  return date.getMonth() === m - 1 ? date : null; // 2026-02-31 is not a day
}

export interface IsoDateRange {
  from: string | null;
  to: string | null;
}

/**
 * A range picker's value as first and last day. Halfway through picking
 * ([start, null]) it is "from start on"; days picked backwards are put in order.
 */
export function rangeToIsoDates(range: readonly (Date | null)[] | null | undefined): IsoDateRange {
  const [a, b] = (range ?? []).map((d) => toIsoDate(d));
  const from = a ?? null;
  const to = b ?? null;
  return from && to && to < from ? { from: to, to: from } : { from, to };
}

/** The range picker's value for first and last day (null when there is no first day). */
export function isoDatesToRange(from: string | null, to: string | null): (Date | null)[] | null {
  const start = fromIsoDate(from);
  return start ? [start, fromIsoDate(to)] : null;
}
