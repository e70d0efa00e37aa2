// The link drawn to scale: end A on the left, end B on the right, each event at its distance from A.
// Events at the same place on several wavelengths share one marker; its outline carries the worst
// severity any reason gives that event. Glyphs are our own: a post for connectors, a bead for splices,
// a fork for splitters, a hook for bends, a cross for breaks.
import type { GradingResult, LinkTest } from "@/lib/grading/schema";
import { formatMetres, ticks } from "./scale";

type Severity = "ok" | "marginal" | "fail";
const STROKE: Record<Severity, string> = { ok: "#3f4e66", marginal: "#a15c00", fail: "#b42318" };

interface Marker {
  positionM: number;
  kind: string;
  lines: string[];
  severity: Severity;
  eventIndexes: number[];
}

const WIDTH = 960;
const LEFT = 40;
const RIGHT = 40;
const AXIS_Y = 92;

function glyph(kind: string, x: number, colour: string) {
  const y = AXIS_Y;
  switch (kind) {
    case "connector":
      return <g><line x1={x} y1={y - 22} x2={x} y2={y + 6} stroke={colour} strokeWidth={3} /><rect x={x - 5} y={y - 30} width={10} height={10} rx={2} fill="white" stroke={colour} strokeWidth={2} /></g>;
    case "splice":
      return <circle cx={x} cy={y} r={6} fill="white" stroke={colour} strokeWidth={2.5} />;
    case "splitter":
      return <path d={`M${x - 8},${y} L${x + 8},${y - 12} M${x - 8},${y} L${x + 8},${y} M${x - 8},${y} L${x + 8},${y + 12}`} stroke={colour} strokeWidth={2.5} fill="none" />;
    case "bend":
      return <path d={`M${x - 9},${y} Q${x},${y - 22} ${x + 9},${y}`} stroke={colour} strokeWidth={2.5} fill="none" />;
    case "break":
      return <path d={`M${x - 8},${y - 8} L${x + 8},${y + 8} M${x + 8},${y - 8} L${x - 8},${y + 8}`} stroke={colour} strokeWidth={3.5} />;
    case "end":
      return <line x1={x} y1={y - 14} x2={x} y2={y + 14} stroke={colour} strokeWidth={4} />;
    case "reflective":
      return <path d={`M${x},${y} L${x},${y - 20} L${x + 6},${y - 14}`} stroke={colour} strokeWidth={2.5} fill="none" />;
    case "non-reflective":
      return <path d={`M${x - 6},${y - 6} L${x},${y} L${x + 6},${y - 6}`} stroke={colour} strokeWidth={2.5} fill="none" />;
    default:
      return <rect x={x - 5} y={y - 5} width={10} height={10} transform={`rotate(45 ${x} ${y})`} fill="white" stroke={colour} strokeWidth={2} />;
  }
}

export function buildMarkers(test: LinkTest, result: GradingResult): Marker[] {
  const worst = new Map<number, Severity>();
  for (const r of result.reasons) {
    if (r.eventIndex === undefined || r.severity === "info") continue;
    const prev = worst.get(r.eventIndex);
    if (r.severity === "fail" || !prev) worst.set(r.eventIndex, r.severity);
  }
  // Readings of one event at several wavelengths differ a little in position (OTDR resolution, group
  // index); the same kind within a few metres counts as one place.
  const tolerance = Math.max(2, linkLengthM(test) * 0.001);
  const markers: Marker[] = [];
  const order = (test.events ?? []).map((e, i) => ({ e, i })).sort((a, b) => a.e.positionM - b.e.positionM);
  for (const { e, i } of order) {
    let m = markers.find((x) => x.kind === e.kind && Math.abs(x.positionM - e.positionM) <= tolerance);
    if (!m) {
      m = { positionM: e.positionM, kind: e.kind, lines: [], severity: "ok", eventIndexes: [] };
      markers.push(m);
    }
    const parts = [`${e.wavelengthNm} nm${e.direction ? ` ${e.direction}` : ""}`];
    if (e.lossDb !== undefined) parts.push(`loss ${e.lossDb.toFixed(2)} dB`);
    if (e.reflectanceDb !== undefined) parts.push(`reflectance ${e.reflectanceDb.toFixed(1)} dB`);
    m.lines.push(parts.join(", "));
    m.eventIndexes.push(i);
    const s = worst.get(i);
    if (s === "fail" || (s === "marginal" && m.severity === "ok")) m.severity = s;
  }
  return markers.sort((a, b) => a.positionM - b.positionM);
}

export function linkLengthM(test: LinkTest): number {
  const lengths = [
    ...test.measurements.map((m) => m.lengthM ?? 0),
    ...(test.events ?? []).map((e) => e.positionM),
    test.link.designLengthM ?? 0,
  ];
  return Math.max(1, ...lengths);
}

export function EventMap({ test, result }: { test: LinkTest; result: GradingResult }) {
  const markers = buildMarkers(test, result);
  const length = linkLengthM(test);
  const scale = (m: number) => LEFT + (m / length) * (WIDTH - LEFT - RIGHT);
  const axisTicks = ticks(length, 8);
  const height = 170;
  if (markers.length === 0) {
    return (
      <p className="rounded-md border border-dashed border-ink-200 p-4 text-sm text-ink-600">
        This test lists no events, so there is no event map. Length {formatMetres(length)}.
      </p>
    );
  }
  return (
    <figure>
      <svg
        viewBox={`0 0 ${WIDTH} ${height}`}
        role="img"
        aria-labelledby="event-map-title"
        className="h-auto w-full rounded-md border border-ink-100 bg-white"
      >
        <title id="event-map-title">{`Event map of ${test.link.ref}: ${markers.length} event positions over ${formatMetres(length)}, drawn to scale`}</title>
        <text x={LEFT} y={AXIS_Y - 48} fontSize={12} fill="#3f4e66" fontWeight={600}>A</text>
        <text x={WIDTH - RIGHT} y={AXIS_Y - 48} fontSize={12} fill="#3f4e66" fontWeight={600} textAnchor="end">B</text>
        <line x1={scale(0)} y1={AXIS_Y} x2={scale(length)} y2={AXIS_Y} stroke="#7b8aa1" strokeWidth={4} strokeLinecap="round" />
        {axisTicks.map((t) => (
          <g key={t}>
            <line x1={scale(t)} y1={AXIS_Y + 26} x2={scale(t)} y2={AXIS_Y + 32} stroke="#7b8aa1" />
            <text x={scale(t)} y={AXIS_Y + 46} fontSize={11} fill="#3f4e66" textAnchor="middle">{formatMetres(t)}</text>
          </g>
        ))}
        <line x1={scale(0)} y1={AXIS_Y + 29} x2={scale(length)} y2={AXIS_Y + 29} stroke="#c9d1dd" />
        {markers.map((m, i) => {
          const x = scale(m.positionM);
          const colour = STROKE[m.severity];
          const label = `${m.kind} at ${formatMetres(m.positionM)}: ${m.lines.join("; ")}${m.severity !== "ok" ? ` (${m.severity})` : ""}`;
          return (
            <g key={i} tabIndex={0} role="img" aria-label={label} data-kind={m.kind} data-severity={m.severity} className="focus:outline-none [&:focus>circle.ring]:opacity-100">
              <title>{label}</title>
              <circle className="ring" cx={x} cy={AXIS_Y} r={16} fill="none" stroke="#0d7c6c" strokeWidth={2} opacity={0} />
              {glyph(m.kind, x, colour)}
              <text x={x} y={i % 2 === 0 ? AXIS_Y - 38 : AXIS_Y + 20} fontSize={10} fill={colour} textAnchor="middle">
                {m.kind === "end" ? "" : formatMetres(m.positionM)}
              </text>
            </g>
          );
        })}
      </svg>
      <figcaption className="mt-2 flex flex-wrap gap-x-4 gap-y-1 text-xs text-ink-600">
        <span>Drawn to scale from end A (0 m) to end B ({formatMetres(length)}).</span>
        <span><span className="font-semibold" style={{ color: STROKE.fail }}>red outline</span>: an event rule failed</span>
        <span><span className="font-semibold" style={{ color: STROKE.marginal }}>amber outline</span>: inside a guard band</span>
        <span>Tab through markers for each event&apos;s readings.</span>
      </figcaption>
    </figure>
  );
}
