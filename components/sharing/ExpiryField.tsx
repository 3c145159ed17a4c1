"use client";

/**
 * What a row holding a secret shares (a share link, an API token): the "Expires after" choice of days (null: until
 * revoked) and the words for its status, so both read the same.
 */
import type { UseFormRegisterReturn } from "react-hook-form";
import { SelectField } from "@/components/ui/Field";

export interface ExpiryChoice {
  days: number | null;
  label: string;
}

/** The select's value as days, or null for "until revoked" (for `register(…, { setValueAs })`). */
export const daysOrNull = (value: string | number | null) => (value === "" || value === null ? null : Number(value));

export function ExpiryField({ choices, registration, error, className }: { choices: ExpiryChoice[]; registration: UseFormRegisterReturn; error?: string; className: string }) {
  return (
    <SelectField label="Expires after" className={className} error={error} {...registration}>
      {choices.map((choice) => (
        <option key={choice.label} value={choice.days ?? ""}>
          {choice.label}
        </option>
      ))}
    </SelectField>
  );
}

export const secretStatusWords: Record<"active" | "expired" | "revoked", { text: string; className: string; icon: string }> = {
  active: { text: "active", className: "text-ink", icon: "●" },
  expired: { text: "expired", className: "text-caution", icon: "⚠" },
  revoked: { text: "revoked", className: "text-ink-faint", icon: "✕" },
};
