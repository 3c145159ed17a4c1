"use client";

import { signIn } from "next-auth/react";
import { useRouter } from "next/navigation";
import { FormProblem } from "@/components/forms/FormProblem";
import { useApiForm } from "@/components/forms/useApiForm";
import { TextField } from "@/components/ui/Field";
import { buttonStyles } from "@/components/ui/styles";
import { passwordResetRequestSchema } from "@/contracts/requests";
import { signInErrorMessage } from "./callbackUrl";

/** Asks next-auth to e-mail a one-time sign-in link (the body is the same one-field e-mail as a reset request). */
export function MagicLinkForm({ callbackUrl }: { callbackUrl: string }) {
  const router = useRouter();
  const { form, problem, setProblem, submit } = useApiForm(passwordResetRequestSchema);
  const { errors, isSubmitting } = form.formState;

  const onSubmit = submit(async ({ email }) => {
    const result = await signIn("email", { email, callbackUrl, redirect: false });
    if (result?.ok && !result.error) router.push("/sign-in/check-email");
    else setProblem(signInErrorMessage(result?.error ?? "EmailSignin"));
  });

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4">
      <FormProblem problem={problem} />
      <TextField label="Address to send the link to" type="email" autoComplete="email" error={errors.email?.message} {...form.register("email")} />
      <button type="submit" disabled={isSubmitting} className={`${buttonStyles.secondary} w-full`}>
        {isSubmitting ? "Sending…" : "E-mail me a sign-in link"}
      </button>
    </form>
  );
}
