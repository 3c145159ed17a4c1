"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm } from "react-hook-form";
import type { z } from "zod";
import { useRequestPasswordReset } from "@/components/api/auth";
import { applyServerErrors } from "@/components/forms/serverErrors";
import { sentence } from "@/components/format/text";
import { TextField } from "@/components/ui/Field";
import { Notice } from "@/components/ui/Notice";
import { buttonStyles } from "@/components/ui/styles";
import { passwordResetRequestSchema } from "@/lib/contracts";

type ResetRequestInput = z.input<typeof passwordResetRequestSchema>;

/** Asks for a reset link. The answer is the same whether or not the address has an account. */
export function ResetRequestForm({ defaultEmail }: { defaultEmail?: string }) {
  const request = useRequestPasswordReset();
  const [problem, setProblem] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors, isSubmitting },
  } = useForm<ResetRequestInput, unknown, z.output<typeof passwordResetRequestSchema>>({
    resolver: zodResolver(passwordResetRequestSchema),
    defaultValues: { email: defaultEmail ?? "" },
  });

  if (request.isSuccess) {
    return <Notice tone="success">{sentence(request.data.message)} Check your inbox; the link works once and expires in one hour.</Notice>;
  }

  const onSubmit = handleSubmit(async (input) => {
    setProblem(null);
    try {
      await request.mutateAsync(input);
    } catch (error) {
      setProblem(applyServerErrors(error, setError, ["email"]));
    }
  });

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-5" aria-label="Ask for a password reset link">
      {problem && <Notice tone="invalid">{sentence(problem)}</Notice>}
      <TextField label="E-mail" type="email" autoComplete="email" error={errors.email?.message} {...register("email")} />
      <button type="submit" disabled={isSubmitting} className={`${buttonStyles.primary} w-full`}>
        {isSubmitting ? "Sending…" : "E-mail me a reset link"}
      </button>
    </form>
  );
}
