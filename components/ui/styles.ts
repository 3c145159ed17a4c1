/** Shared class lists, so every button, field and table in the app looks the same. */

const buttonBase =
  "inline-flex items-center justify-center gap-2 rounded px-4 py-2 text-sm font-semibold transition-colors disabled:cursor-not-allowed disabled:opacity-50";

export const buttonStyles = {
  /** The one main action of a form or page: ink on paper, inverted. */
  primary: `${buttonBase} bg-ink text-paper hover:bg-ink-soft`,
  /** Every other action: a thin border. */
  secondary: `${buttonBase} border border-rule-strong bg-paper text-ink hover:border-ink`,
  /** Small actions inside table rows. */
  row: "rounded px-2 py-1 text-sm text-ink-soft underline-offset-4 hover:text-ink hover:underline disabled:cursor-not-allowed disabled:opacity-50",
} as const;

export const fieldStyles = {
  label: "block text-sm font-semibold text-ink",
  hint: "mt-1 text-sm text-ink-faint",
  control:
    "mt-1 block w-full rounded border border-rule-strong bg-white px-3 py-2 text-base text-ink placeholder:text-ink-faint hover:border-ink-faint aria-[invalid=true]:border-invalid aria-[invalid=true]:bg-invalid-bg/40",
} as const;

export const tableStyles = {
  /** `data-table`: on a phone the table scrolls sideways on its own (app/globals.css), never the page. */
  table: "data-table w-full border-collapse text-left text-sm",
  head: "border-b border-ink/70 px-3 py-2 align-bottom text-xs font-semibold uppercase tracking-wide text-ink-soft",
  row: "border-b border-rule",
  cell: "px-3 py-3 align-top",
} as const;

export const linkStyles = "text-ink underline decoration-rule-strong underline-offset-4 hover:decoration-ink";
