// The package date as a Date at UTC midnight: the only date the PDF carries, so the same
// input gives the same bytes in every time zone.
export function packageDate(isoDate: string): Date {
  const m = /^(\d{4})-(\d{2})-(\d{2})$/.exec(isoDate);
  if (!m) throw new Error(`package date '${isoDate}' is not an ISO date (yyyy-mm-dd)`);
  const date = new Date(Date.UTC(Number(m[1]), Number(m[2]) - 1, Number(m[3])));
  if (date.toISOString().slice(0, 10) !== isoDate) throw new Error(`package date '${isoDate}' is not a calendar date`);
  return date;
}
