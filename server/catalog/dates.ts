/** Today as an ISO date (YYYY-MM-DD, UTC): price dates are compared as text in this form. */
export function todayIso(now: Date = new Date()): string {
  return now.toISOString().slice(0, 10);
}
