"use client";

import { useRequestPasswordReset } from "@/components/api/auth";
import { sentence } from "@/components/format/text";
import { FormProblem } from "@/components/forms/FormProblem";
import { useApiForm } from "@/components/forms/useApiForm";
import { TextField } from "@/components/ui/Field";
import { Notice } from "@/components/ui/Notice";
import { buttonStyles } from "@/components/ui/styles";
import { passwordResetRequestSchema } from "@/contracts/requests";

/** Asks for a reset link. The answer is the same whether or not the address has an account. */
export function ResetRequestForm({ defaultEmail }: { defaultEmail?: string }) {
  const request = useRequestPasswordReset();
  const { form, problem, submit } = useApiForm(passwordResetRequestSchema, { defaultValues: { email: defaultEmail ?? "" } });
  const { errors, isSubmitting } = form.formState;

  if (request.isSuccess) {
    return <Notice tone="success">{sentence(request.data.message)} Check your inbox; the link works once and expires in one hour.</Notice>;
  }

  return (
    <form onSubmit={submit((input) => request.mutateAsync(input))} noValidate className="space-y-5">
      <FormProblem problem={problem} />
      <TextField label="E-mail" type="email" autoComplete="email" error={errors.email?.message} {...form.register("email")} />
      <button type="submit" disabled={isSubmitting} className={`${buttonStyles.primary} w-full`}>
        {isSubmitting ? "Sending…" : "E-mail me a reset link"}
      </button>
    </form>
  );
}
