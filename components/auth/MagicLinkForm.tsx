"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { signIn } from "next-auth/react";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { sentence } from "@/components/format/text";
import { TextField } from "@/components/ui/Field";
import { Notice } from "@/components/ui/Notice";
import { buttonStyles } from "@/components/ui/styles";
import { passwordResetRequestSchema } from "@/lib/contracts";
import { signInErrorMessage } from "./callbackUrl";

/** Asks next-auth to e-mail a one-time sign-in link (the schema is the same one-field e-mail body). */
export function MagicLinkForm({ callbackUrl }: { callbackUrl: string }) {
  const router = useRouter();
  const [problem, setProblem] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    formState: { errors, isSubmitting },
  } = useForm<{ email: string }>({ resolver: zodResolver(passwordResetRequestSchema) });

  const onSubmit = handleSubmit(async ({ email }) => {
    setProblem(null);
    const result = await signIn("email", { email, callbackUrl, redirect: false });
    if (result?.ok && !result.error) router.push("/sign-in/check-email");
    else setProblem(signInErrorMessage(result?.error ?? "EmailSignin"));
  });

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4" aria-label="E-mail me a sign-in link">
      {problem && <Notice tone="invalid">{sentence(problem)}</Notice>}
      <TextField label="Address to send the link to" type="email" autoComplete="email" error={errors.email?.message} {...register("email")} />
      <button type="submit" disabled={isSubmitting} className={`${buttonStyles.secondary} w-full`}>
        {isSubmitting ? "Sending…" : "E-mail me a sign-in link"}
      </button>
    </form>
  );
}
