/** Icons for flags and notes, drawn (not font glyphs, which some fonts lack), always beside words. */
export function FlagIcon({ kind }: { kind: "invalid" | "caution" | "note" }) {
  return (
    <svg width="14" height="14" viewBox="0 0 14 14" aria-hidden="true" className="mt-px shrink-0">
      {kind === "caution" && (
        <>
          <path d="M7 1.2 13 12.5H1z" fill="none" stroke="currentColor" strokeWidth="1.4" strokeLinejoin="round" />
          <path d="M7 5.2v3.6M7 10.2v.9" stroke="currentColor" strokeWidth="1.5" strokeLinecap="round" />
        </>
      )}
      {kind === "invalid" && (
        <>
          <circle cx="7" cy="7" r="5.8" fill="none" stroke="currentColor" strokeWidth="1.4" />
          <path d="M4.6 4.6l4.8 4.8M9.4 4.6l-4.8 4.8" stroke="currentColor" strokeWidth="1.5" strokeLinecap="round" />
        </>
      )}
      {kind === "note" && (
        <>
          <circle cx="7" cy="7" r="5.8" fill="none" stroke="currentColor" strokeWidth="1.2" />
          <path d="M7 6.2v4M7 3.9v.6" stroke="currentColor" strokeWidth="1.5" strokeLinecap="round" />
        </>
      )}
    </svg>
  );
}
