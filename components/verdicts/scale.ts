// Round tick steps for an axis (1, 2 or 5 times a power of ten), so distances read naturally.
export function niceStep(span: number, targetTicks: number): number {
  if (!(span > 0)) return 1;
  const raw = span / Math.max(1, targetTicks);
  const pow = 10 ** Math.floor(Math.log10(raw));
  const m = raw / pow;
  return (m <= 1 ? 1 : m <= 2 ? 2 : m <= 5 ? 5 : 10) * pow;
}

export function ticks(max: number, targetTicks: number): number[] {
  const step = niceStep(max, targetTicks);
  const out: number[] = [];
  for (let v = 0; v <= max + step * 1e-9; v += step) out.push(Math.round(v * 1e6) / 1e6);
  return out;
}

export function formatMetres(m: number): string {
  if (m >= 1000) return `${+(m / 1000).toFixed(m % 1000 === 0 ? 0 : 2)} km`;
  return `${+m.toFixed(1)} m`;
}

export function formatDb(db: number, signed = false): string {
  const s = db.toFixed(2);
  return signed && db > 0 ? `+${s} dB` : `${s} dB`;
}
