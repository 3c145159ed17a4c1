"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { signIn } from "next-auth/react";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { z } from "zod";
import { sentence } from "@/components/format/text";
import { TextField } from "@/components/ui/Field";
import { Notice } from "@/components/ui/Notice";
import { buttonStyles } from "@/components/ui/styles";
import { emailSchema } from "@/lib/contracts";

const signInSchema = z.object({ email: emailSchema, password: z.string().min(1, "enter your password") });
type SignInInput = z.input<typeof signInSchema>;

/** next-auth reports a plain wrong password as this code; anything else is the server's own message. */
const WRONG_CREDENTIALS = "CredentialsSignin";

export function SignInForm({ callbackUrl }: { callbackUrl: string }) {
  const [problem, setProblem] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    formState: { errors, isSubmitting },
  } = useForm<SignInInput, unknown, z.output<typeof signInSchema>>({ resolver: zodResolver(signInSchema) });

  const onSubmit = handleSubmit(async ({ email, password }) => {
    setProblem(null);
    const result = await signIn("credentials", { redirect: false, email, password, callbackUrl });
    if (result?.ok && !result.error) {
      // A full load, so the header and every server component see the new session.
      window.location.assign(callbackUrl);
      return;
    }
    setProblem(!result?.error || result.error === WRONG_CREDENTIALS ? "e-mail or password is wrong" : result.error);
  });

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-5" aria-label="Sign in with a password">
      {problem && <Notice tone="invalid">{sentence(problem)}</Notice>}
      <TextField label="E-mail" type="email" autoComplete="email" error={errors.email?.message} {...register("email")} />
      <TextField label="Password" type="password" autoComplete="current-password" error={errors.password?.message} {...register("password")} />
      <button type="submit" disabled={isSubmitting} className={`${buttonStyles.primary} w-full`}>
        {isSubmitting ? "Signing in…" : "Sign in"}
      </button>
    </form>
  );
}
