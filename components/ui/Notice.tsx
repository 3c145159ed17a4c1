import type { ReactNode } from "react";

const tones = {
  invalid: { box: "border-invalid-line bg-invalid-bg text-invalid", icon: "⚠", label: "Problem" },
  caution: { box: "border-caution-line bg-caution-bg text-caution", icon: "⚠", label: "Note" },
  info: { box: "border-rule bg-paper-deep text-ink-soft", icon: "i", label: "Note" },
  success: { box: "border-rule bg-paper-deep text-ink", icon: "✓", label: "Done" },
} as const;

/**
 * A boxed message for a whole form or page. Problems are announced to screen readers (role="alert"), the rest
 * politely; each tone has its own icon, so the meaning never rests on colour alone.
 */
interface NoticeProps {
  tone?: keyof typeof tones;
  children: ReactNode;
  /** A control at the right, e.g. "Try again". */
  action?: ReactNode;
  /** Shows a "Dismiss" button that calls this. */
  onDismiss?: () => void;
}

export function Notice({ tone = "info", children, action, onDismiss }: NoticeProps) {
  const style = tones[tone];
  return (
    <div role={tone === "invalid" ? "alert" : "status"} className={`flex items-start gap-2 rounded border px-3 py-2 text-sm ${style.box}`}>
      <span aria-hidden="true" className={tone === "info" ? "mt-0.5 inline-flex h-4 w-4 shrink-0 items-center justify-center rounded-full border border-current font-serif text-[0.7rem] italic leading-none" : "leading-5"}>
        {style.icon}
      </span>
      <span className="sr-only">{style.label}: </span>
      <div className="flex-1 leading-5">{children}</div>
      {action}
      {onDismiss && (
        <button type="button" onClick={onDismiss} className="-my-1 rounded px-2 py-1 text-sm underline-offset-4 hover:underline">
          Dismiss
        </button>
      )}
    </div>
  );
}
