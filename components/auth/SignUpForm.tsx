"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { signIn } from "next-auth/react";
import { useState } from "react";
import { useForm } from "react-hook-form";
import type { z } from "zod";
import { useSignUp } from "@/components/api/auth";
import { applyServerErrors } from "@/components/forms/serverErrors";
import { sentence } from "@/components/format/text";
import { TextField } from "@/components/ui/Field";
import { Notice } from "@/components/ui/Notice";
import { buttonStyles } from "@/components/ui/styles";
import { signUpSchema } from "@/lib/contracts";

type SignUpInput = z.input<typeof signUpSchema>;

export function SignUpForm({ callbackUrl }: { callbackUrl: string }) {
  const signUp = useSignUp();
  const [problem, setProblem] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors, isSubmitting },
  } = useForm<SignUpInput, unknown, z.output<typeof signUpSchema>>({ resolver: zodResolver(signUpSchema) });

  const onSubmit = handleSubmit(async (input) => {
    setProblem(null);
    try {
      await signUp.mutateAsync(input);
    } catch (error) {
      setProblem(applyServerErrors(error, setError, ["name", "email", "password"]));
      return;
    }
    const result = await signIn("credentials", { redirect: false, email: input.email, password: input.password, callbackUrl });
    if (result?.ok && !result.error) window.location.assign(callbackUrl);
    else setProblem("your account is ready, but signing in did not work; sign in with your new password");
  });

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-5" aria-label="Sign up">
      {problem && <Notice tone="invalid">{sentence(problem)}</Notice>}
      <TextField label="Name" autoComplete="name" hint="Shown to the people you share projects with." error={errors.name?.message} {...register("name")} />
      <TextField label="E-mail" type="email" autoComplete="email" error={errors.email?.message} {...register("email")} />
      <TextField
        label="Password"
        type="password"
        autoComplete="new-password"
        hint="At least 10 characters."
        error={errors.password?.message}
        {...register("password")}
      />
      <button type="submit" disabled={isSubmitting} className={`${buttonStyles.primary} w-full`}>
        {isSubmitting ? "Creating your account…" : "Sign up"}
      </button>
    </form>
  );
}
