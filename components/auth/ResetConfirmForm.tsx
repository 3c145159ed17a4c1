"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import Link from "next/link";
import { useState } from "react";
import { useForm } from "react-hook-form";
import type { z } from "zod";
import { useConfirmPasswordReset } from "@/components/api/auth";
import { applyServerErrors } from "@/components/forms/serverErrors";
import { sentence } from "@/components/format/text";
import { TextField } from "@/components/ui/Field";
import { Notice } from "@/components/ui/Notice";
import { buttonStyles, linkStyles } from "@/components/ui/styles";
import { passwordResetConfirmSchema } from "@/lib/contracts";

type ResetConfirmInput = z.input<typeof passwordResetConfirmSchema>;

export function ResetConfirmForm({ token }: { token: string }) {
  const confirm = useConfirmPasswordReset();
  const [problem, setProblem] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors, isSubmitting },
  } = useForm<ResetConfirmInput, unknown, z.output<typeof passwordResetConfirmSchema>>({
    resolver: zodResolver(passwordResetConfirmSchema),
    defaultValues: { token, password: "" },
  });

  if (confirm.isSuccess) {
    return (
      <Notice tone="success">
        {sentence(confirm.data.message)}{" "}
        <Link href="/sign-in" className={linkStyles}>
          Sign in
        </Link>
      </Notice>
    );
  }

  const onSubmit = handleSubmit(async (input) => {
    setProblem(null);
    try {
      await confirm.mutateAsync(input);
    } catch (error) {
      setProblem(applyServerErrors(error, setError, ["password"]));
    }
  });

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-5" aria-label="Choose a new password">
      {(problem || errors.token) && (
        <Notice tone="invalid">
          {sentence(problem ?? errors.token?.message ?? "")}{" "}
          <Link href="/reset-password" className={linkStyles}>
            Ask for a new link
          </Link>
        </Notice>
      )}
      <input type="hidden" {...register("token")} />
      <TextField
        label="New password"
        type="password"
        autoComplete="new-password"
        hint="At least 10 characters."
        error={errors.password?.message}
        {...register("password")}
      />
      <button type="submit" disabled={isSubmitting} className={`${buttonStyles.primary} w-full`}>
        {isSubmitting ? "Saving…" : "Set the new password"}
      </button>
    </form>
  );
}
