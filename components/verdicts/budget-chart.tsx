// Per wavelength: how much loss the profile allows (the budget post), the guard band below it (hatched),
// and what was measured (the bar), with the headroom written at the end. Reading left to right answers
// "how close to the limit is this link?" faster than a table of numbers.
import type { GradingResult } from "@/lib/grading/schema";
import { formatDb, ticks } from "./scale";

const FILL = { pass: "#1d7a46", marginal: "#a15c00", fail: "#b42318" } as const;
const WIDTH = 960;
const LABEL_W = 90;
const RIGHT = 150;
const ROW_H = 44;
const TOP = 12;

export function BudgetChart({ result }: { result: GradingResult }) {
  const rows = result.wavelengths;
  if (rows.length === 0) {
    return (
      <p className="rounded-md border border-dashed border-ink-200 p-4 text-sm text-ink-600">
        No insertion loss was measured, so there is no budget to compare against.
      </p>
    );
  }
  const max = Math.max(...rows.flatMap((w) => [w.budgetDb, w.measuredDb])) * 1.1 || 1;
  const x = (db: number) => LABEL_W + (Math.max(0, db) / max) * (WIDTH - LABEL_W - RIGHT);
  const height = TOP + rows.length * ROW_H + 34;
  const axis = ticks(max, 8);
  return (
    <figure>
      <svg viewBox={`0 0 ${WIDTH} ${height}`} role="img" aria-labelledby="budget-chart-title" className="h-auto w-full rounded-md border border-ink-100 bg-white">
        <title id="budget-chart-title">{`Loss budget against measured insertion loss for ${rows.length} wavelength${rows.length === 1 ? "" : "s"}`}</title>
        <defs>
          <pattern id="guard-hatch" width={6} height={6} patternUnits="userSpaceOnUse" patternTransform="rotate(45)">
            <line x1={0} y1={0} x2={0} y2={6} stroke="#a15c00" strokeWidth={2} opacity={0.45} />
          </pattern>
        </defs>
        {axis.map((t) => (
          <g key={t}>
            <line x1={x(t)} y1={TOP - 4} x2={x(t)} y2={TOP + rows.length * ROW_H} stroke="#e6eaf0" />
            <text x={x(t)} y={TOP + rows.length * ROW_H + 16} fontSize={11} fill="#3f4e66" textAnchor="middle">{t}</text>
          </g>
        ))}
        <text x={WIDTH - RIGHT} y={TOP + rows.length * ROW_H + 30} fontSize={11} fill="#3f4e66" textAnchor="end">insertion loss, dB</text>
        {rows.map((w, i) => {
          const y = TOP + i * ROW_H;
          const guardStart = Math.max(0, w.budgetDb - w.guardBandDb);
          const label = `${w.wavelengthNm} nm: measured ${formatDb(w.measuredDb)} against a budget of ${formatDb(w.budgetDb)} (${w.limitBasis}); headroom ${formatDb(w.headroomDb, true)}; ${w.verdict}`;
          return (
            <g key={`${w.wavelengthNm}-${i}`} data-wavelength={w.wavelengthNm}>
              <title>{label}</title>
              <text x={LABEL_W - 10} y={y + ROW_H / 2 + 4} fontSize={13} fill="#111827" textAnchor="end" fontWeight={600}>{w.wavelengthNm} nm</text>
              {w.guardBandDb > 0 && <rect x={x(guardStart)} y={y + 6} width={Math.max(1, x(w.budgetDb) - x(guardStart))} height={ROW_H - 12} fill="url(#guard-hatch)" />}
              <rect x={x(0)} y={y + 13} width={Math.max(1, x(w.measuredDb) - x(0))} height={ROW_H - 26} rx={3} fill={FILL[w.verdict]} />
              <line x1={x(w.budgetDb)} y1={y + 3} x2={x(w.budgetDb)} y2={y + ROW_H - 3} stroke="#111827" strokeWidth={3} />
              <text x={x(w.budgetDb) + 6} y={y + 12} fontSize={10} fill="#111827">budget {w.budgetDb.toFixed(2)}</text>
              <text x={WIDTH - RIGHT + 10} y={y + ROW_H / 2 + 4} fontSize={13} fill={FILL[w.verdict]} fontWeight={600}>
                {w.headroomDb >= 0 ? `${formatDb(w.headroomDb, true)} left` : `${formatDb(-w.headroomDb)} over`}
              </text>
            </g>
          );
        })}
      </svg>
      <figcaption className="mt-2 text-xs text-ink-600">
        Bar: worst measured insertion loss. Black post: the budget (the tighter of the component loss budget and any
        application or PON class maximum). Hatched: the guard band from the test method&apos;s uncertainty.
      </figcaption>
      <table className="sr-only">
        <caption>Budget and measured loss per wavelength</caption>
        <thead><tr><th>Wavelength</th><th>Budget dB</th><th>Measured dB</th><th>Headroom dB</th><th>Verdict</th></tr></thead>
        <tbody>
          {rows.map((w, i) => (
            <tr key={i}><td>{w.wavelengthNm} nm</td><td>{w.budgetDb.toFixed(2)}</td><td>{w.measuredDb.toFixed(2)}</td><td>{w.headroomDb.toFixed(2)}</td><td>{w.verdict}</td></tr>
          ))}
        </tbody>
      </table>
    </figure>
  );
}
