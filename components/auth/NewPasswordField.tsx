import type { ComponentProps } from "react";
import { TextField } from "@/components/ui/Field";

/** A field for choosing a password, with the server's rule as its hint. */
export function NewPasswordField({ label = "Password", error, ...input }: Omit<ComponentProps<typeof TextField>, "label" | "type"> & { label?: string }) {
  return <TextField label={label} type="password" autoComplete="new-password" hint="At least 10 characters." error={error} {...input} />;
}
