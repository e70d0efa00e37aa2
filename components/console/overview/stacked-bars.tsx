// A small stacked bar chart in plain SVG: one bar per day, one segment per series. Each bar has a
// <title> for hover, and the same figures are in a visually hidden table for screen readers.

export interface Series<K extends string> {
  key: K;
  label: string;
  /** A Tailwind fill class, e.g. "fill-verdict-pass". */
  fill: string;
}

function niceMax(v: number): number {
  if (v <= 5) return 5;
  const p = 10 ** Math.floor(Math.log10(v));
  for (const m of [1, 2, 2.5, 5, 10]) if (m * p >= v) return m * p;
  return 10 * p;
}

export function StackedBars<K extends string>({
  title,
  data,
  series,
  height = 180,
}: {
  title: string;
  data: ({ day: string } & Record<K, number>)[];
  series: Series<K>[];
  height?: number;
}) {
  const W = 640;
  const H = height;
  const pad = { l: 36, r: 8, t: 8, b: 22 };
  const innerW = W - pad.l - pad.r;
  const innerH = H - pad.t - pad.b;
  const totals = data.map((d) => series.reduce((s, x) => s + d[x.key], 0));
  const max = niceMax(Math.max(0, ...totals));
  const step = innerW / Math.max(data.length, 1);
  const bw = Math.max(2, step * 0.7);
  const y = (v: number) => pad.t + innerH - (v / max) * innerH;
  const ticks = [0, max / 2, max];
  const labelEvery = Math.ceil(data.length / 6);
  return (
    <figure>
      <svg viewBox={`0 0 ${W} ${H}`} role="img" aria-label={title} className="h-auto w-full">
        {ticks.map((t) => (
          <g key={t}>
            <line x1={pad.l} x2={W - pad.r} y1={y(t)} y2={y(t)} className="stroke-ink-100" strokeWidth={1} />
            <text x={pad.l - 6} y={y(t) + 3} textAnchor="end" className="fill-ink-400 text-[10px]">{Number.isInteger(t) ? t : t.toFixed(1)}</text>
          </g>
        ))}
        {data.map((d, i) => {
          let acc = 0;
          const x = pad.l + i * step + (step - bw) / 2;
          return (
            <g key={d.day}>
              <title>{`${d.day}: ${series.map((s) => `${s.label} ${d[s.key]}`).join(", ")}`}</title>
              {series.map((s) => {
                const v = d[s.key];
                if (!v) return null;
                const y0 = y(acc);
                acc += v;
                return <rect key={s.key} x={x} width={bw} y={y(acc)} height={Math.max(0, y0 - y(acc))} className={s.fill} />;
              })}
              {/* Full-height transparent target so the tooltip works on empty days too. */}
              <rect x={pad.l + i * step} width={step} y={pad.t} height={innerH} fill="transparent" />
              {i % labelEvery === 0 && (
                <text x={x + bw / 2} y={H - 6} textAnchor="middle" className="fill-ink-400 text-[10px]">{d.day.slice(5)}</text>
              )}
            </g>
          );
        })}
      </svg>
      <figcaption className="mt-1 flex flex-wrap gap-3 text-xs text-ink-600">
        {series.map((s) => (
          <span key={s.key} className="inline-flex items-center gap-1">
            <svg width="10" height="10" aria-hidden><rect width="10" height="10" rx="2" className={s.fill} /></svg>
            {s.label}
          </span>
        ))}
      </figcaption>
      <table className="sr-only">
        <caption>{title}</caption>
        <thead><tr><th scope="col">Day</th>{series.map((s) => <th key={s.key} scope="col">{s.label}</th>)}</tr></thead>
        <tbody>{data.map((d) => <tr key={d.day}><th scope="row">{d.day}</th>{series.map((s) => <td key={s.key}>{d[s.key]}</td>)}</tr>)}</tbody>
      </table>
    </figure>
  );
}
