"use client";

/**
 * A number with its unit, typed as text ("250 ms", "3 us", "10 Msun") and parsed with physics/units. The value is
 * committed on Enter or when the field loses focus; a parse error or a refused edit shows under the field, in
 * words with an icon, and the typed text stays for correction. Escape puts back the current value.
 */
import { useId, useState, type KeyboardEvent } from "react";
import { FieldMessage } from "@/components/ui/Field";
import { fieldStyles } from "@/components/ui/styles";
import { parseQuantity, type QuantityDimension } from "@/physics/units";

export type CommitResult = { ok: true } | { ok: false; message: string };

interface QuantityFieldProps {
  label: string;
  dimension: QuantityDimension;
  /** How the current value reads when the field is not being edited. */
  shown: string;
  onCommit(valueSI: number): CommitResult;
  hint?: string;
  disabled?: boolean;
  /** Unit assumed for a bare number, when there is an obvious one. */
  defaultUnit?: string;
  testId?: string;
  onFocus?(): void;
  compact?: boolean;
}

export function QuantityField({ label, dimension, shown, onCommit, hint, disabled, defaultUnit, testId, onFocus, compact }: QuantityFieldProps) {
  const id = useId();
  const [draft, setDraft] = useState<string | null>(null);
  const [error, setError] = useState<string | null>(null);
  const errorId = `${id}-error`;
  const hintId = `${id}-hint`;

  const commit = () => {
    if (draft === null) return;
    if (draft.trim() === shown.trim()) {
      setDraft(null);
      setError(null);
      return;
    }
    const parsed = parseQuantity(draft, dimension, defaultUnit ? { defaultUnit } : {});
    if (!parsed.ok) return setError(parsed.message);
    const result = onCommit(parsed.valueSI);
    if (!result.ok) return setError(result.message);
    setDraft(null);
    setError(null);
  };

  const onKeyDown = (event: KeyboardEvent<HTMLInputElement>) => {
    if (event.key === "Enter") {
      event.preventDefault();
      commit();
    } else if (event.key === "Escape") {
      setDraft(null);
      setError(null);
    }
  };

  return (
    <div className={compact ? "min-w-0" : undefined}>
      <label htmlFor={id} className={compact ? "block text-xs font-semibold text-ink-soft" : fieldStyles.label}>
        {label}
      </label>
      <input
        id={id}
        data-testid={testId}
        className={`${fieldStyles.control} tabular disabled:cursor-not-allowed disabled:border-rule disabled:bg-paper-deep disabled:text-ink-soft ${compact ? "px-2 py-1 text-sm" : ""}`}
        value={draft ?? shown}
        disabled={disabled}
        spellCheck={false}
        autoComplete="off"
        aria-invalid={Boolean(error)}
        aria-describedby={error ? errorId : hint ? hintId : undefined}
        onFocus={onFocus}
        onChange={(e) => setDraft(e.target.value)}
        onBlur={commit}
        onKeyDown={onKeyDown}
      />
      {hint && !error && (
        <p id={hintId} className={fieldStyles.hint}>
          {hint}
        </p>
      )}
      {error && <FieldMessage id={errorId}>{error}</FieldMessage>}
    </div>
  );
}
