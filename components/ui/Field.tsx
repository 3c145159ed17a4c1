"use client";

import { useId, type ComponentProps, type ReactNode } from "react";
import { fieldStyles } from "./styles";

/** A message under a field or form: words and an icon, never colour alone. */
export function FieldMessage({ id, children }: { id?: string; children: ReactNode }) {
  return (
    <p id={id} className="mt-1 flex gap-1.5 text-sm text-invalid">
      <span aria-hidden="true">⚠</span>
      <span>{children}</span>
    </p>
  );
}

/** The label of a compact field: small, above its control. */
const COMPACT_LABEL = "block text-xs font-semibold text-ink-soft";

interface FieldFrameProps {
  label: string;
  hint?: ReactNode;
  error?: string;
  className?: string;
  /** A small label above a small control, for dense panels (the editor's). */
  compact?: boolean;
  /** Renders the control with the id and aria attributes that tie it to its label and messages. */
  children: (control: { id: string; "aria-invalid": boolean; "aria-describedby"?: string }) => ReactNode;
}

export function FieldFrame({ label, hint, error, className, compact = false, children }: FieldFrameProps) {
  const id = useId();
  // The hint gives way to the error: describe the control by the one shown.
  const hintId = hint && !error ? `${id}-hint` : undefined;
  const errorId = error ? `${id}-error` : undefined;
  const describedBy = [hintId, errorId].filter(Boolean).join(" ") || undefined;
  return (
    <div className={[compact ? "min-w-0" : "", className ?? ""].join(" ").trim() || undefined}>
      <label htmlFor={id} className={compact ? COMPACT_LABEL : fieldStyles.label}>
        {label}
      </label>
      {children({ id, "aria-invalid": Boolean(error), "aria-describedby": describedBy })}
      {hintId && (
        <p id={hintId} className={fieldStyles.hint}>
          {hint}
        </p>
      )}
      {error && <FieldMessage id={errorId}>{error}</FieldMessage>}
    </div>
  );
}

type TextFieldProps = Omit<ComponentProps<"input">, "id" | "className"> & { label: string; hint?: ReactNode; error?: string; className?: string };

export function TextField({ label, hint, error, className, ...input }: TextFieldProps) {
  return (
    <FieldFrame label={label} hint={hint} error={error} className={className}>
      {(control) => <input {...input} {...control} className={fieldStyles.control} />}
    </FieldFrame>
  );
}

type TextAreaFieldProps = Omit<ComponentProps<"textarea">, "id" | "className"> & { label: string; hint?: ReactNode; error?: string; className?: string };

export function TextAreaField({ label, hint, error, className, ...textarea }: TextAreaFieldProps) {
  return (
    <FieldFrame label={label} hint={hint} error={error} className={className}>
      {(control) => <textarea rows={3} {...textarea} {...control} className={fieldStyles.control} />}
    </FieldFrame>
  );
}

type SelectFieldProps = Omit<ComponentProps<"select">, "id" | "className"> & { label: string; hint?: ReactNode; error?: string; className?: string };

export function SelectField({ label, hint, error, className, children, ...select }: SelectFieldProps) {
  return (
    <FieldFrame label={label} hint={hint} error={error} className={className}>
      {(control) => (
        <select {...select} {...control} className={fieldStyles.control}>
          {children}
        </select>
      )}
    </FieldFrame>
  );
}

/** A small labelled choice for dense panels (the editor's): the words shown for each value, the value handed back. */
export function CompactSelect<T extends string>({
  label,
  value,
  options,
  onChange,
  ariaLabel,
}: {
  label: ReactNode;
  value: T;
  options: readonly { value: T; words: ReactNode }[];
  onChange(value: T): void;
  /** Names the control for screen readers where the visible label is shared or short. */
  ariaLabel?: string;
}) {
  return (
    <label className={`${COMPACT_LABEL} min-w-0 max-w-full`}>
      {label}
      <select
        className="mt-1 block max-w-full rounded border border-rule-strong bg-white px-2 py-1.5 text-sm font-normal text-ink"
        value={value}
        onChange={(e) => onChange(e.target.value as T)}
        aria-label={ariaLabel}
      >
        {options.map((option) => (
          <option key={option.value} value={option.value}>
            {option.words}
          </option>
        ))}
      </select>
    </label>
  );
}
