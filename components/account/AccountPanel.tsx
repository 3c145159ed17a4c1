"use client";

import { signOut } from "next-auth/react";
import Link from "next/link";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { z } from "zod";
import { useAccount, useSignOutEverywhere, useUpdateAccount, type UserDto } from "@/components/api/account";
import { messageOf } from "@/components/api/client";
import { FormProblem } from "@/components/forms/FormProblem";
import { useApiForm } from "@/components/forms/useApiForm";
import { TextField } from "@/components/ui/Field";
import { Notice } from "@/components/ui/Notice";
import { QueryView } from "@/components/ui/QueryStates";
import { TimeStamp } from "@/components/ui/TimeStamp";
import { buttonStyles, linkStyles } from "@/components/ui/styles";
import { displayNameSchema } from "@/contracts/requests";

const nameSchema = z.object({ name: displayNameSchema });

export function AccountPanel() {
  const account = useAccount();
  return (
    <QueryView query={account} what="your account">
      {(user) => <AccountDetails user={user} />}
    </QueryView>
  );
}

function AccountDetails({ user }: { user: UserDto }) {
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
        <SignOutEverywhere />
      </section>
    </div>
  );
}

/** Ends every session of the account at once: other browsers and devices are signed out at their next request. */
function SignOutEverywhere() {
  const end = useSignOutEverywhere();
  const [problem, setProblem] = useState<string | null>(null);
  const onClick = async () => {
    setProblem(null);
    try {
      await end.mutateAsync();
      await signOut({ callbackUrl: "/sign-in" });
    } catch (error) {
      setProblem(messageOf(error));
    }
  };
  return (
    <div>
      <h3 className="text-sm font-semibold">Sessions</h3>
      <p className="mt-1 text-sm text-ink-soft">
        Signed in somewhere you no longer use, or on a shared computer? This signs you out on every browser and
        device, this one included.
      </p>
      <FormProblem problem={problem} />
      <button type="button" onClick={onClick} disabled={end.isPending} className={`${buttonStyles.secondary} mt-3`}>
        {end.isPending ? "Signing out everywhere…" : "Sign out everywhere"}
      </button>
    </div>
  );
}

function NameForm({ user }: { user: UserDto }) {
  const router = useRouter();
  const update = useUpdateAccount();
  const [saved, setSaved] = useState(false);
  const { form, problem, submit } = useApiForm(nameSchema, { defaultValues: { name: user.name } });
  const { errors, isSubmitting, isDirty } = form.formState;

  const onSubmit = submit(async (input) => {
    setSaved(false);
    const updated = await update.mutateAsync(input);
    form.reset({ name: updated.name });
    setSaved(true);
    // The header shows the name; it is drawn on the server.
    router.refresh();
  });

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-5">
      <h2 className="font-serif text-xl font-semibold">Your name</h2>
      <FormProblem problem={problem} />
      {saved && !isDirty && <Notice tone="success">Saved.</Notice>}
      <TextField
        label="Name"
        autoComplete="name"
        hint="Shown beside your changes and in member lists."
        error={errors.name?.message}
        {...form.register("name")}
      />
      <button type="submit" disabled={isSubmitting || !isDirty} className={buttonStyles.primary}>
        {isSubmitting ? "Saving…" : "Save name"}
      </button>
    </form>
  );
}
