"use client";

import Link from "next/link";
import { useConfirmPasswordReset } from "@/components/api/auth";
import { sentence } from "@/components/format/text";
import { useApiForm } from "@/components/forms/useApiForm";
import { Notice } from "@/components/ui/Notice";
import { buttonStyles, linkStyles } from "@/components/ui/styles";
import { passwordResetConfirmSchema } from "@/contracts/requests";
import { NewPasswordField } from "./NewPasswordField";

export function ResetConfirmForm({ token }: { token: string }) {
  const confirm = useConfirmPasswordReset();
  const { form, problem, submit } = useApiForm(passwordResetConfirmSchema, { defaultValues: { token, password: "" } });
  const { errors, isSubmitting } = form.formState;

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

  // A bad link (missing, used or expired) is the only problem the person cannot fix in this form.
  const linkProblem = problem ?? errors.token?.message;

  return (
    <form onSubmit={submit((input) => confirm.mutateAsync(input))} noValidate className="space-y-5">
      {linkProblem && (
        <Notice tone="invalid">
          {sentence(linkProblem)}{" "}
          <Link href="/reset-password" className={linkStyles}>
            Ask for a new link
          </Link>
        </Notice>
      )}
      <input type="hidden" {...form.register("token")} />
      <NewPasswordField label="New password" error={errors.password?.message} {...form.register("password")} />
      <button type="submit" disabled={isSubmitting} className={`${buttonStyles.primary} w-full`}>
        {isSubmitting ? "Saving…" : "Set the new password"}
      </button>
    </form>
  );
}
