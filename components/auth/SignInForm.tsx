"use client";

import { signIn } from "next-auth/react";
import { z } from "zod";
import { FormProblem } from "@/components/forms/FormProblem";
import { useApiForm } from "@/components/forms/useApiForm";
import { TextField } from "@/components/ui/Field";
import { buttonStyles } from "@/components/ui/styles";
import { emailSchema } from "@/contracts/requests";

const signInSchema = z.object({ email: emailSchema, password: z.string().min(1, "enter your password") });

/** next-auth reports a plain wrong password as this code; anything else is the server's own message. */
const WRONG_CREDENTIALS = "CredentialsSignin";

export function SignInForm({ callbackUrl }: { callbackUrl: string }) {
  const { form, problem, setProblem, submit } = useApiForm(signInSchema);
  const { errors, isSubmitting } = form.formState;

  const onSubmit = submit(async ({ email, password }) => {
    const result = await signIn("credentials", { redirect: false, email, password, callbackUrl });
    if (result?.ok && !result.error) {
      // A full load, so the header and every server component see the new session.
      window.location.assign(callbackUrl);
      return;
    }
    setProblem(!result?.error || result.error === WRONG_CREDENTIALS ? "e-mail or password is wrong" : result.error);
  });

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-5">
      <FormProblem problem={problem} />
      <TextField label="E-mail" type="email" autoComplete="email" error={errors.email?.message} {...form.register("email")} />
      <TextField label="Password" type="password" autoComplete="current-password" error={errors.password?.message} {...form.register("password")} />
      <button type="submit" disabled={isSubmitting} className={`${buttonStyles.primary} w-full`}>
        {isSubmitting ? "Signing in…" : "Sign in"}
      </button>
    </form>
  );
}
