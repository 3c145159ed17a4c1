"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm } from "react-hook-form";
import type { z } from "zod";
import { useAddMember } from "@/components/api/members";
import { roleNames } from "@/components/format/words";
import { sentence } from "@/components/format/text";
import { applyServerErrors } from "@/components/forms/serverErrors";
import { SelectField, TextField } from "@/components/ui/Field";
import { Notice } from "@/components/ui/Notice";
import { buttonStyles } from "@/components/ui/styles";
import { memberAddSchema } from "@/lib/contracts";

type AddMemberInput = z.input<typeof memberAddSchema>;

export function AddMemberForm({ projectId }: { projectId: string }) {
  const add = useAddMember(projectId);
  const [problem, setProblem] = useState<string | null>(null);
  const [added, setAdded] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    reset,
    formState: { errors, isSubmitting },
  } = useForm<AddMemberInput, unknown, z.output<typeof memberAddSchema>>({
    resolver: zodResolver(memberAddSchema),
    defaultValues: { email: "", role: "editor" },
  });

  const onSubmit = handleSubmit(async (input) => {
    setProblem(null);
    setAdded(null);
    try {
      const member = await add.mutateAsync(input);
      reset({ email: "", role: input.role });
      setAdded(`${member.name} (${member.email}) is now ${roleNames[member.role].toLowerCase()}.`);
    } catch (error) {
      setProblem(applyServerErrors(error, setError, ["email", "role"]));
    }
  });

  return (
    <form onSubmit={onSubmit} noValidate aria-labelledby="add-member-title" className="border-b border-rule pb-8">
      <h2 id="add-member-title" className="mb-1 font-serif text-xl font-semibold">
        Add a member
      </h2>
      <p className="mb-4 text-sm text-ink-soft">They need a Branchline account with this e-mail address.</p>
      {problem && (
        <div className="mb-4">
          <Notice tone="invalid">{sentence(problem)}</Notice>
        </div>
      )}
      {added && (
        <div className="mb-4">
          <Notice tone="success">{added}</Notice>
        </div>
      )}
      <div className="flex flex-wrap items-start gap-4">
        <TextField label="E-mail" type="email" autoComplete="off" className="min-w-64 flex-1" error={errors.email?.message} {...register("email")} />
        <SelectField label="Role" className="w-40" error={errors.role?.message} {...register("role")}>
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
