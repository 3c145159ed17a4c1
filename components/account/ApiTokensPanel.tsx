"use client";

import { useState } from "react";
import { type ApiTokenDto, useApiTokens, useCreateApiToken, useRevokeApiToken } from "@/components/api/api-tokens";
import { useProjects } from "@/components/api/projects";
import { FormProblem } from "@/components/forms/FormProblem";
import { useApiForm } from "@/components/forms/useApiForm";
import { CopyButton } from "@/components/sharing/ShareLinksPanel";
import { daysOrNull, type ExpiryChoice, ExpiryField, secretStatusWords } from "@/components/sharing/ExpiryField";
import { RevokeButton, RevokeDialog, useRevokeConfirmation } from "@/components/sharing/RevokeRowAction";
import { EmptyState } from "@/components/ui/EmptyState";
import { SelectField, TextField } from "@/components/ui/Field";
import { Notice } from "@/components/ui/Notice";
import { QueryView } from "@/components/ui/QueryStates";
import { TableHead } from "@/components/ui/TableHead";
import { TimeStamp } from "@/components/ui/TimeStamp";
import { buttonStyles, fieldStyles, tableStyles } from "@/components/ui/styles";
import { apiTokenCreateSchema } from "@/contracts/requests";

const expiryChoices: ExpiryChoice[] = [
  { days: 7, label: "7 days" },
  { days: 30, label: "30 days" },
  { days: 90, label: "90 days" },
  { days: 365, label: "1 year" },
  { days: null, label: "Until revoked" },
];

const scopeWords: Record<ApiTokenDto["scope"], string> = { read: "Read", "read-write": "Read and write" };


const columns = [{ label: "Name" }, { label: "Access" }, { label: "Created" }, { label: "Expires" }, { label: "Last used" }, { label: "Status" }, { label: "Actions", hiddenLabel: true }];

function CreateTokenForm({ onCreated }: { onCreated: (name: string, token: string) => void }) {
  const create = useCreateApiToken();
  const projects = useProjects();
  const { form, problem, submit } = useApiForm(apiTokenCreateSchema, { defaultValues: { name: "", scope: "read", projectId: null, expiresInDays: 90 } });
  const { errors, isSubmitting } = form.formState;
  const onSubmit = submit(async (input) => {
    const { token, apiToken } = await create.mutateAsync(input);
    form.reset({ name: "", scope: input.scope, projectId: input.projectId ?? null, expiresInDays: input.expiresInDays });
    onCreated(apiToken.name, token);
  });
  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4">
      <p className="text-sm text-ink-soft">
        A token lets a script or notebook use the API as you (<code>Authorization: Bearer …</code>), with at most the access you choose here and
        never more than your own role in each project. Keep it like a password.
      </p>
      <FormProblem problem={problem} />
      <div className="flex flex-wrap items-start gap-4">
        <TextField label="Name" placeholder="analysis notebook" autoComplete="off" className="min-w-56 flex-1" error={errors.name?.message} {...form.register("name")} />
        <SelectField label="Access" className="w-44" error={errors.scope?.message} {...form.register("scope")}>
          <option value="read">{scopeWords.read}</option>
          <option value="read-write">{scopeWords["read-write"]}</option>
        </SelectField>
        <SelectField label="Projects" className="w-56" error={errors.projectId?.message} {...form.register("projectId", { setValueAs: (value: string | null) => (value === "" ? null : value) })}>
          <option value="">All my projects</option>
          {(projects.data ?? []).map((p) => (
            <option key={p.id} value={p.id}>
              Only {p.name}
            </option>
          ))}
        </SelectField>
        <ExpiryField choices={expiryChoices} className="w-40" error={errors.expiresInDays?.message} registration={form.register("expiresInDays", { setValueAs: daysOrNull })} />
        <button type="submit" disabled={isSubmitting} className={`${buttonStyles.primary} mt-6`}>
          {isSubmitting ? "Creating…" : "Create token"}
        </button>
      </div>
    </form>
  );
}

/**
 * The account's personal API tokens: make one (name, access, project, expiry), see when each was last used, revoke.
 * Only a hash of each token is stored, so a token can be copied only in the visit that created it.
 */
export function ApiTokensPanel() {
  const tokens = useApiTokens();
  const revoke = useRevokeApiToken();
  const [latest, setLatest] = useState<{ name: string; token: string } | null>(null);
  const revoking = useRevokeConfirmation();
  return (
    <section aria-labelledby="api-tokens-title" className="max-w-5xl space-y-6">
      <h2 id="api-tokens-title" className="font-serif text-xl font-semibold">
        API tokens
      </h2>
      <CreateTokenForm onCreated={(name, token) => setLatest({ name, token })} />
      {latest && (
        <Notice tone="success" onDismiss={() => setLatest(null)}>
          <p>The token “{latest.name}” is ready. Copy it now: Branchline keeps only a fingerprint of it and cannot show it again.</p>
          <div className="mt-2 flex flex-wrap items-center gap-2">
            <label htmlFor="new-api-token" className="sr-only">
              New API token
            </label>
            <input id="new-api-token" readOnly value={latest.token} onFocus={(e) => e.currentTarget.select()} className={`${fieldStyles.control} mt-0 min-w-72 flex-1 font-mono text-sm`} />
            <CopyButton url={latest.token} label="Copy the new token" words="Copy token" />
          </div>
        </Notice>
      )}
      <QueryView query={tokens} what="your API tokens" lines={3}>
        {(list) =>
          list.length === 0 ? (
            <EmptyState title="No API tokens yet">Create one above to read or change your scenarios from a script or a notebook.</EmptyState>
          ) : (
            <table className={tableStyles.table}>
              <caption className="sr-only">Your API tokens, newest first</caption>
              <TableHead columns={columns} />
              <tbody>
                {list.map((t) => {
                  const status = secretStatusWords[t.status];
                  return (
                    <tr key={t.id} className={tableStyles.row}>
                      <td className={`${tableStyles.cell} font-semibold`}>{t.name}</td>
                      <td className={tableStyles.cell}>
                        {scopeWords[t.scope]}
                        <span className="block text-xs text-ink-faint">{t.project ? `only ${t.project.name}` : "all my projects"}</span>
                      </td>
                      <td className={tableStyles.cell}>
                        <TimeStamp iso={t.createdAt} />
                      </td>
                      <td className={tableStyles.cell}>{t.expiresAt ? <TimeStamp iso={t.expiresAt} /> : <span className="text-ink-soft">never</span>}</td>
                      <td className={tableStyles.cell}>{t.lastUsedAt ? <TimeStamp iso={t.lastUsedAt} /> : <span className="text-ink-soft">not yet</span>}</td>
                      <td className={`${tableStyles.cell} ${status.className}`}>
                        <span aria-hidden="true">{status.icon} </span>
                        {status.text}
                      </td>
                      <td className={`${tableStyles.cell} whitespace-nowrap text-right`}>
                        {t.status === "active" && <RevokeButton target={{ id: t.id, name: `“${t.name}”` }} onAsk={revoking.ask} />}
                      </td>
                    </tr>
                  );
                })}
              </tbody>
            </table>
          )
        }
      </QueryView>
      <RevokeDialog target={revoking.target} onClose={revoking.close} revoke={revoke} confirmLabel="Revoke token">
        Scripts using this token will get “401 unauthenticated” from now on. It stays listed here.
      </RevokeDialog>
    </section>
  );
}
