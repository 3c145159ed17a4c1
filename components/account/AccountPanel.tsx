"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import Link from "next/link";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { z } from "zod";
import { useAccount, useUpdateAccount, type UserDto } from "@/components/api/account";
import { sentence } from "@/components/format/text";
import { applyServerErrors } from "@/components/forms/serverErrors";
import { TextField } from "@/components/ui/Field";
import { Notice } from "@/components/ui/Notice";
import { LoadError, Skeleton } from "@/components/ui/QueryStates";
import { TimeStamp } from "@/components/ui/TimeStamp";
import { buttonStyles, linkStyles } from "@/components/ui/styles";
import { displayNameSchema } from "@/lib/contracts";

const nameSchema = z.object({ name: displayNameSchema });
type NameInput = z.input<typeof nameSchema>;

export function AccountPanel() {
  const account = useAccount();
  if (account.isPending) return <Skeleton lines={4} label="Loading your account" />;
  if (account.isError) return <LoadError error={account.error} onRetry={() => account.refetch()} what="your account" />;
  const user = account.data;
  return (
    <div className="grid max-w-3xl gap-12 md:grid-cols-2">
      <NameForm user={user} />
      <section aria-labelledby="account-details-title" className="space-y-6">
        <h2 id="account-details-title" className="font-serif text-xl font-semibold">
          Sign-in
        </h2>
        <dl className="border-t border-ink/70 text-sm">
          <div className="grid grid-cols-[8rem_1fr] gap-4 border-b border-rule py-2">
            <dt className="text-ink-soft">E-mail</dt>
            <dd className="break-all">
              {user.email}
              <span className="ml-2 text-ink-faint">{user.emailVerifiedAt ? "(confirmed)" : "(not confirmed yet)"}</span>
            </dd>
          </div>
          <div className="grid grid-cols-[8rem_1fr] gap-4 border-b border-rule py-2">
            <dt className="text-ink-soft">Site role</dt>
            <dd>{user.siteRole === "admin" ? "Administrator" : "Member"}</dd>
          </div>
          <div className="grid grid-cols-[8rem_1fr] gap-4 py-2">
            <dt className="text-ink-soft">Member since</dt>
            <dd>
              <TimeStamp iso={user.createdAt} layout="inline" />
            </dd>
          </div>
        </dl>
        <div>
          <h3 className="text-sm font-semibold">Password</h3>
          <p className="mt-1 text-sm text-ink-soft">
            To change it, we e-mail you a link to choose a new one.{" "}
            <Link href={`/reset-password?email=${encodeURIComponent(user.email)}`} className={linkStyles}>
              Change password
            </Link>
          </p>
        </div>
      </section>
    </div>
  );
}

function NameForm({ user }: { user: UserDto }) {
  const router = useRouter();
  const update = useUpdateAccount();
  const [problem, setProblem] = useState<string | null>(null);
  const [saved, setSaved] = useState(false);
  const {
    register,
    handleSubmit,
    setError,
    reset,
    formState: { errors, isSubmitting, isDirty },
  } = useForm<NameInput, unknown, z.output<typeof nameSchema>>({ resolver: zodResolver(nameSchema), defaultValues: { name: user.name } });

  const onSubmit = handleSubmit(async (input) => {
    setProblem(null);
    setSaved(false);
    try {
      const updated = await update.mutateAsync(input);
      reset({ name: updated.name });
      setSaved(true);
      // The header shows the name; it is drawn on the server.
      router.refresh();
    } catch (error) {
      setProblem(applyServerErrors(error, setError, ["name"]));
    }
  });

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-5" aria-labelledby="account-name-title">
      <h2 id="account-name-title" className="font-serif text-xl font-semibold">
        Your name
      </h2>
      {problem && <Notice tone="invalid">{sentence(problem)}</Notice>}
      {saved && !isDirty && <Notice tone="success">Saved.</Notice>}
      <TextField
        label="Name"
        autoComplete="name"
        hint="Shown beside your changes and in member lists."
        error={errors.name?.message}
        {...register("name")}
      />
      <button type="submit" disabled={isSubmitting || !isDirty} className={buttonStyles.primary}>
        {isSubmitting ? "Saving…" : "Save name"}
      </button>
    </form>
  );
}
