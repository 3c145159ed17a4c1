"use client";

import { useEffect, useId, useRef, useState, type ReactNode } from "react";
import { Notice } from "./Notice";
import { buttonStyles, fieldStyles } from "./styles";

interface ConfirmDialogProps {
  open: boolean;
  title: string;
  children?: ReactNode;
  confirmLabel: string;
  /** When set, the person must type this text before the action is enabled (for what cannot be undone). */
  typeToConfirm?: string;
  pending?: boolean;
  error?: string | null;
  onConfirm: () => void;
  onCancel: () => void;
}

/**
 * A modal question on a native <dialog>: the browser traps focus and closes it on Escape; focus goes back to
 * whatever had it before the dialog opened.
 */
export function ConfirmDialog({ open, title, children, confirmLabel, typeToConfirm, pending, error, onConfirm, onCancel }: ConfirmDialogProps) {
  const dialog = useRef<HTMLDialogElement>(null);
  const opener = useRef<Element | null>(null);
  const [typed, setTyped] = useState("");
  const titleId = useId();
  const inputId = useId();

  useEffect(() => {
    const el = dialog.current;
    if (!el) return;
    if (open && !el.open) {
      opener.current = document.activeElement;
      setTyped("");
      el.showModal();
    } else if (!open && el.open) {
      el.close();
    }
  }, [open]);

  const restoreFocus = () => {
    if (opener.current instanceof HTMLElement && opener.current.isConnected) opener.current.focus();
  };

  const confirmed = typeToConfirm === undefined || typed.trim() === typeToConfirm.trim();

  return (
    <dialog
      ref={dialog}
      aria-labelledby={titleId}
      onClose={() => {
        restoreFocus();
        if (open) onCancel();
      }}
      className="m-auto w-full max-w-md rounded border border-rule bg-paper p-0 text-ink shadow-sheet backdrop:bg-ink/30"
    >
      <form
        method="dialog"
        className="space-y-4 p-6"
        onSubmit={(event) => {
          event.preventDefault();
          if (confirmed && !pending) onConfirm();
        }}
      >
        <h2 id={titleId} className="font-serif text-xl font-semibold">
          {title}
        </h2>
        {children && <div className="text-sm leading-relaxed text-ink-soft">{children}</div>}
        {typeToConfirm !== undefined && (
          <div>
            <label htmlFor={inputId} className={fieldStyles.label}>
              Type <span className="font-mono">{typeToConfirm}</span> to confirm
            </label>
            <input
              id={inputId}
              autoFocus
              autoComplete="off"
              value={typed}
              onChange={(event) => setTyped(event.target.value)}
              className={fieldStyles.control}
            />
          </div>
        )}
        {error && <Notice tone="caution">{error}</Notice>}
        <div className="flex justify-end gap-3 pt-2">
          <button type="button" autoFocus={typeToConfirm === undefined} onClick={onCancel} className={buttonStyles.secondary}>
            Cancel
          </button>
          <button type="submit" disabled={!confirmed || pending} className={buttonStyles.primary}>
            {pending ? "Working…" : confirmLabel}
          </button>
        </div>
      </form>
    </dialog>
  );
}
