/** The report's date and time in UTC, "2026-12-02 14:05 UTC" (ISO 8601 order, unambiguous on paper). */
export function reportDateText(date: Date): string {
  const t = date.getTime();
  if (!Number.isFinite(t)) throw new RangeError('reportDateText: date must be a valid Date');
  return `${date.toISOString().slice(0, 16).replace('T', ' ')} UTC`;
}
