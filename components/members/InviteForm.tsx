"use client";

import { useState } from "react";
import { useInvite } from "@/components/api/invitations";
import { roleNames } from "@/components/format/words";
import { FormProblem } from "@/components/forms/FormProblem";
import { useApiForm } from "@/components/forms/useApiForm";
import { SelectField, TextField } from "@/components/ui/Field";
import { Notice } from "@/components/ui/Notice";
import { buttonStyles } from "@/components/ui/styles";
import { invitationCreateSchema, invitedRoleSchema } from "@/contracts/requests";

const invitedRoles = invitedRoleSchema.options;

/** Owners invite by e-mail; the person joins when they follow the link, with an account of that address. */
export function InviteForm({ projectId }: { projectId: string }) {
  const invite = useInvite(projectId);
  const [sent, setSent] = useState<string | null>(null);
  const { form, problem, submit } = useApiForm(invitationCreateSchema, { defaultValues: { email: "", role: "viewer" } });
  const { errors, isSubmitting } = form.formState;

  const onSubmit = submit(async (input) => {
    setSent(null);
    const invitation = await invite.mutateAsync(input);
    form.reset({ email: "", role: input.role });
    setSent(`An invitation to join as ${roleNames[invitation.role].toLowerCase()} is on its way to ${invitation.email}. The link works once, for 7 days.`);
  });

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4 border-b border-rule pb-8">
      <div>
        <h2 className="font-serif text-xl font-semibold">Invite by e-mail</h2>
        <p className="mt-1 text-sm text-ink-soft">
          They get a link; following it, they sign in or create an account with this address and join. Make someone an
          owner once they have joined.
        </p>
      </div>
      <FormProblem problem={problem} />
      {sent && <Notice tone="success">{sent}</Notice>}
      <div className="flex flex-wrap items-start gap-4">
        <TextField label="E-mail" type="email" autoComplete="off" className="min-w-64 flex-1" error={errors.email?.message} {...form.register("email")} />
        <SelectField label="Role" className="w-40" error={errors.role?.message} {...form.register("role")}>
          {invitedRoles.map((role) => (
            <option key={role} value={role}>
              {roleNames[role]}
            </option>
          ))}
        </SelectField>
        <button type="submit" disabled={isSubmitting} className={`${buttonStyles.primary} mt-6`}>
          {isSubmitting ? "Sending…" : "Send invitation"}
        </button>
      </div>
    </form>
  );
}
