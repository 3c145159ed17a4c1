"use client";

import { useState } from "react";
import { useAddMember } from "@/components/api/members";
import { roleNames } from "@/components/format/words";
import { FormProblem } from "@/components/forms/FormProblem";
import { useApiForm } from "@/components/forms/useApiForm";
import { SelectField, TextField } from "@/components/ui/Field";
import { Notice } from "@/components/ui/Notice";
import { buttonStyles } from "@/components/ui/styles";
import { memberAddSchema } from "@/lib/contracts";

export function AddMemberForm({ projectId }: { projectId: string }) {
  const add = useAddMember(projectId);
  const [added, setAdded] = useState<string | null>(null);
  const { form, problem, submit } = useApiForm(memberAddSchema, { defaultValues: { email: "", role: "editor" } });
  const { errors, isSubmitting } = form.formState;

  const onSubmit = submit(async (input) => {
    setAdded(null);
    const member = await add.mutateAsync(input);
    form.reset({ email: "", role: input.role });
    setAdded(`${member.name} (${member.email}) is now ${roleNames[member.role].toLowerCase()}.`);
  });

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4 border-b border-rule pb-8">
      <div>
        <h2 className="font-serif text-xl font-semibold">Add a member</h2>
        <p className="mt-1 text-sm text-ink-soft">They need a Branchline account with this e-mail address.</p>
      </div>
      <FormProblem problem={problem} />
      {added && <Notice tone="success">{added}</Notice>}
      <div className="flex flex-wrap items-start gap-4">
        <TextField label="E-mail" type="email" autoComplete="off" className="min-w-64 flex-1" error={errors.email?.message} {...form.register("email")} />
        <SelectField label="Role" className="w-40" error={errors.role?.message} {...form.register("role")}>
          {(Object.keys(roleNames) as (keyof typeof roleNames)[]).map((role) => (
            <option key={role} value={role}>
              {roleNames[role]}
            </option>
          ))}
        </SelectField>
        <button type="submit" disabled={isSubmitting} className={`${buttonStyles.primary} mt-6`}>
          {isSubmitting ? "Adding…" : "Add member"}
        </button>
      </div>
    </form>
  );
}
