"use client";

/**
 * Fields that commit what is typed: on Enter or when the field loses focus the text is parsed and handed to the
 * editor; a parse error or a refused edit shows under the field, in words with an icon, and the typed text stays for
 * correction. Escape puts back the current value. QuantityField reads a number with its unit ("250 ms", "3 us",
 * "10 Msun") with physics/units; DraftField takes any parse (a profile formula, say).
 */
import { useState, type KeyboardEvent } from "react";
import { FieldFrame } from "@/components/ui/Field";
import { fieldStyles } from "@/components/ui/styles";
import { formatInUnit, parseQuantity, type LengthScales, type NamedUnit, type QuantityDimension } from "@/physics/units";

export type CommitResult = { ok: true } | { ok: false; message: string };
export type ParseResult<T> = { ok: true; value: T } | { ok: false; message: string };

interface DraftFieldProps<T> {
  label: string;
  /** How the current value reads when the field is not being edited. */
  shown: string;
  parse(text: string): ParseResult<T>;
  onCommit(value: T): CommitResult;
  hint?: string;
  disabled?: boolean;
  testId?: string;
  onFocus?(): void;
  compact?: boolean;
  /** Extra classes for the control (a formula's monospace, say). */
  controlClassName?: string;
}

export function DraftField<T>({ label, shown, parse, onCommit, hint, disabled, testId, onFocus, compact, controlClassName = "tabular" }: DraftFieldProps<T>) {
  const [draft, setDraft] = useState<string | null>(null);
  const [error, setError] = useState<string | null>(null);

  const commit = () => {
    if (draft === null) return;
    if (draft.trim() === shown.trim()) {
      setDraft(null);
      setError(null);
      return;
    }
    const parsed = parse(draft);
    if (!parsed.ok) return setError(parsed.message);
    const result = onCommit(parsed.value);
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
    <FieldFrame label={label} hint={hint} error={error ?? undefined} compact={compact}>
      {(control) => (
        <input
          {...control}
          data-testid={testId}
          className={`${fieldStyles.control} ${controlClassName} disabled:cursor-not-allowed disabled:border-rule disabled:bg-paper-deep disabled:text-ink-soft ${compact ? "px-2 py-1 text-sm" : ""}`}
          value={draft ?? shown}
          disabled={disabled}
          spellCheck={false}
          autoComplete="off"
          onFocus={onFocus}
          onChange={(e) => setDraft(e.target.value)}
          onBlur={commit}
          onKeyDown={onKeyDown}
        />
      )}
    </FieldFrame>
  );
}

interface QuantityFieldProps extends Omit<DraftFieldProps<number>, "parse" | "controlClassName"> {
  dimension: QuantityDimension;
  /** Unit assumed for a bare number, when there is an obvious one. */
  defaultUnit?: string;
  /** The background's own lengths (r_s and GM/c², or c/H), accepted as units of a length. */
  lengthScales?: LengthScales;
  /** The value in SI. With it, a value typed in a named unit (e, M☉, r_s, GM/c², c/H) is shown back in that unit. */
  valueSI?: number;
  /** The named unit to show the value in until something else is typed. */
  initialUnit?: NamedUnit;
}

/**
 * A quantity with its unit. The value is echoed in the unit last typed when that is one of our named units ("100 e"
 * stays "100 e", "3 rs" reads back "3 r_s"); a value typed in SI units is shown with SI prefixes.
 */
export function QuantityField({ dimension, defaultUnit, lengthScales, valueSI, initialUnit, shown, onCommit, ...field }: QuantityFieldProps) {
  // undefined: nothing typed yet (initialUnit applies); null: last typed in SI units.
  const [typedUnit, setTypedUnit] = useState<NamedUnit | null | undefined>(undefined);
  const echoUnit = typedUnit === undefined ? initialUnit : typedUnit;
  const echoed = valueSI !== undefined && echoUnit ? formatInUnit(valueSI, echoUnit, lengthScales) : null;
  const parse = (text: string): ParseResult<{ valueSI: number; unit: NamedUnit | null }> => {
    const parsed = parseQuantity(text, dimension, { ...(defaultUnit ? { defaultUnit } : {}), lengthScales });
    return parsed.ok ? { ok: true, value: { valueSI: parsed.valueSI, unit: parsed.unit ?? null } } : parsed;
  };
  return (
    <DraftField
      {...field}
      shown={echoed ?? shown}
      parse={parse}
      onCommit={(typed) => {
        const result = onCommit(typed.valueSI);
        if (result.ok) setTypedUnit(typed.unit);
        return result;
      }}
    />
  );
}