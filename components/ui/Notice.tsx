import type { ReactNode } from "react";

const tones = {
  invalid: { box: "border-invalid-line bg-invalid-bg text-invalid", icon: "⚠", label: "Problem" },
  caution: { box: "border-caution-line bg-caution-bg text-caution", icon: "⚠", label: "Note" },
  info: { box: "border-rule bg-paper-deep text-ink-soft", icon: "ⓘ", label: "Note" },
  success: { box: "border-rule bg-paper-deep text-ink", icon: "✓", label: "Done" },
} as const;

/**
 * A boxed message for a whole form or page. Problems are announced to screen readers (role="alert"), the rest
 * politely; each tone has its own icon, so the meaning never rests on colour alone.
 */
export function Notice({ tone = "info", children, action }: { tone?: keyof typeof tones; children: ReactNode; action?: ReactNode }) {
  const style = tones[tone];
  return (
    <div role={tone === "invalid" ? "alert" : "status"} className={`flex items-start gap-2 rounded border px-3 py-2 text-sm ${style.box}`}>
      <span aria-hidden="true" className="leading-5">
        {style.icon}
      </span>
      <span className="sr-only">{style.label}: </span>
      <div className="flex-1 leading-5">{children}</div>
      {action}
    </div>
  );
}
