/** The last `n` UTC calendar days ending today, oldest first, as YYYY-MM-DD. */
export function lastDays(n: number, now: Date = new Date()): string[] {
  const end = Date.UTC(now.getUTCFullYear(), now.getUTCMonth(), now.getUTCDate());
  return Array.from({ length: n }, (_, i) => new Date(end - (n - 1 - i) * 86_400_000).toISOString().slice(0, 10));
}

/** Spreads sparse per-day rows over every day of the range, filling gaps with zeros. */
export function fillDays<K extends string>(days: string[], keys: readonly K[], rows: { day: string; key: K; n: number }[]): ({ day: string } & Record<K, number>)[] {
  const byDay = new Map(days.map((d) => [d, Object.fromEntries(keys.map((k) => [k, 0])) as Record<K, number>]));
  for (const r of rows) {
    const slot = byDay.get(r.day);
    if (slot && r.key in slot) slot[r.key] += r.n;
  }
  return days.map((day) => ({ day, ...byDay.get(day)! }));
}
