"use client";

import { signIn } from "next-auth/react";
import { useSignUp } from "@/components/api/auth";
import { FormProblem } from "@/components/forms/FormProblem";
import { useApiForm } from "@/components/forms/useApiForm";
import { TextField } from "@/components/ui/Field";
import { buttonStyles } from "@/components/ui/styles";
import { signUpSchema } from "@/contracts/requests";
import { NewPasswordField } from "./NewPasswordField";

/** A new account; `email` fills in the address an invitation was sent to. */
export function SignUpForm({ callbackUrl, email = "" }: { callbackUrl: string; email?: string }) {
  const signUp = useSignUp();
  const { form, problem, setProblem, submit } = useApiForm(signUpSchema, { defaultValues: { email } });
  const { errors, isSubmitting } = form.formState;

  const onSubmit = submit(async (input) => {
    await signUp.mutateAsync(input);
    const result = await signIn("credentials", { redirect: false, email: input.email, password: input.password, callbackUrl });
    if (result?.ok && !result.error) window.location.assign(callbackUrl);
    // The server answers a sign-up the same whether or not the address already had an account (its owner gets a
    // message instead), so all we can say here is both.
    else setProblem("signing in did not work: if this address already has an account, we have e-mailed it; otherwise sign in with your new password");
  });

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-5">
      <FormProblem problem={problem} />
      <TextField label="Name" autoComplete="name" hint="Shown to the people you share projects with." error={errors.name?.message} {...form.register("name")} />
      <TextField label="E-mail" type="email" autoComplete="email" error={errors.email?.message} {...form.register("email")} />
      <NewPasswordField error={errors.password?.message} {...form.register("password")} />
      <button type="submit" disabled={isSubmitting} className={`${buttonStyles.primary} w-full`}>
        {isSubmitting ? "Creating your account…" : "Sign up"}
      </button>
    </form>
  );
}
