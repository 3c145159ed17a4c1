/** The key to the figures: branch A solid orange, branch B dashed blue, and the two radiation tints. */
export function BranchLegend({ radiation = false }: { radiation?: boolean }) {
  return (
    <ul className="flex flex-wrap items-center gap-x-5 gap-y-1 text-xs text-ink-soft">
      <li className="flex items-center gap-1.5">
        <svg width="26" height="8" aria-hidden="true">
          <line x1="1" y1="4" x2="25" y2="4" stroke="#E69F00" strokeWidth="2.5" />
        </svg>
        branch A (solid)
      </li>
      <li className="flex items-center gap-1.5">
        <svg width="26" height="8" aria-hidden="true">
          <line x1="1" y1="4" x2="25" y2="4" stroke="#0072B2" strokeWidth="2" strokeDasharray="7 4" />
        </svg>
        branch B (dashed)
      </li>
      {radiation && (
        <>
          <li className="flex items-center gap-1.5">
            <span aria-hidden="true" className="inline-block h-3 w-5 border border-rule" style={{ background: "rgba(230, 159, 0, 0.16)" }} />
            radiated toward ℐ⁺ by the ramps
          </li>
          <li className="flex items-center gap-1.5">
            <span aria-hidden="true" className="inline-block h-3 w-5 border border-rule" style={{ background: "rgba(0, 114, 178, 0.13)" }} />
            taken by the horizon while apart
          </li>
        </>
      )}
    </ul>
  );
}
