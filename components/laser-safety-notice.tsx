// Shown wherever a page displays test data or guides field work.
export function LaserSafetyNotice({ compact = false }: { compact?: boolean }) {
  return (
    <aside
      role="note"
      aria-label="Laser safety"
      className="rounded-md border border-amber-300 bg-amber-50 px-4 py-3 text-sm text-amber-950"
    >
      <p className="font-semibold">Safety in the field</p>
      <p className={compact ? "mt-1" : "mt-1 leading-relaxed"}>
        Test light is usually infrared and invisible. Never look into a fibre end, connector or adapter,
        and never with a microscope or magnifier unless it is a video scope or has a laser filter; confirm the
        fibre is dark with a power meter first. Collect fibre offcuts in a marked container, wear safety
        glasses with side shields, and keep food and drink away from the work area. These notes do not replace
        your local codes, the IEC 60825 series, your employer&apos;s procedures or licensed practice.
      </p>
    </aside>
  );
}
