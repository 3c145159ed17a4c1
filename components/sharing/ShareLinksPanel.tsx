"use client";

import { useState } from "react";
import { useCreateShareLink, useRevokeShareLink, useShareLinks, type ShareLinkDto } from "@/components/api/share-links";
import { FormProblem } from "@/components/forms/FormProblem";
import { useApiForm } from "@/components/forms/useApiForm";
import { EmptyState } from "@/components/ui/EmptyState";
import { SelectField, TextField } from "@/components/ui/Field";
import { Notice } from "@/components/ui/Notice";
import { QueryView } from "@/components/ui/QueryStates";
import { TableHead } from "@/components/ui/TableHead";
import { TimeStamp } from "@/components/ui/TimeStamp";
import { embedSnippet, type EmbedOptions } from "@/components/export/embed-options";
import { buttonStyles, fieldStyles, tableStyles } from "@/components/ui/styles";
import { shareLinkCreateSchema } from "@/contracts/requests";
import { RevokeButton, RevokeDialog, useRevokeConfirmation } from "./RevokeRowAction";

const expiryChoices: { days: number | null; label: string }[] = [
  { days: null, label: "Until revoked" },
  { days: 1, label: "1 day" },
  { days: 7, label: "7 days" },
  { days: 30, label: "30 days" },
  { days: 90, label: "90 days" },
];

const columns = [
  { label: "Label" },
  { label: "Created" },
  { label: "Expires" },
  { label: "Views", className: "text-right" },
  { label: "Status" },
  { label: "Actions", hiddenLabel: true },
];

const statusWords: Record<ShareLinkDto["status"], { text: string; className: string; icon: string }> = {
  active: { text: "active", className: "text-ink", icon: "●" },
  expired: { text: "expired", className: "text-caution", icon: "⚠" },
  revoked: { text: "revoked", className: "text-ink-faint", icon: "✕" },
};

/** The embed code of a share link's URL (the embed takes the same token). */
function embedCodeOf(url: string, options: Partial<EmbedOptions> = {}): string {
  const parsed = new URL(url);
  return embedSnippet(parsed.origin, decodeURIComponent(parsed.pathname.split("/").pop() ?? ""), options);
}

/** Copies to the clipboard, saying so; where the browser refuses, the URL stays selectable on the page. */
function CopyButton({ url, label, words = "Copy URL" }: { url: string; label: string; words?: string }) {
  const [copied, setCopied] = useState<"yes" | "failed" | null>(null);
  return (
    <button
      type="button"
      className={buttonStyles.row}
      aria-label={label}
      onClick={() =>
        navigator.clipboard.writeText(url).then(
          () => setCopied("yes"),
          () => setCopied("failed"),
        )
      }
    >
      {copied === "yes" ? "Copied ✓" : copied === "failed" ? "Copy by hand" : words}
    </button>
  );
}

/**
 * The <iframe> code that shows the link's Diagram alone in a page or a slide, with its options: the dark figure
 * theme for a dark room, large labels for projection, and a time scrubber that plays the protocol.
 */
function EmbedCode({ url }: { url: string }) {
  const [options, setOptions] = useState<Pick<EmbedOptions, "largeType" | "scrub"> & { dark: boolean }>({ dark: false, largeType: false, scrub: false });
  const code = embedCodeOf(url, { theme: options.dark ? "dark" : null, largeType: options.largeType, scrub: options.scrub });
  const toggle = (key: keyof typeof options, words: string) => (
    <label className="flex items-center gap-1.5 text-sm">
      <input type="checkbox" checked={options[key]} onChange={(e) => setOptions((o) => ({ ...o, [key]: e.target.checked }))} />
      {words}
    </label>
  );
  return (
    <div className="mt-4 space-y-2">
      <p>To show the Diagram alone in a page or a slide, paste this embed code (the embed stops working when the link does):</p>
      <div className="flex flex-wrap gap-4">
        {toggle("dark", "Dark figure")}
        {toggle("largeType", "Large labels")}
        {toggle("scrub", "Time scrubber")}
      </div>
      <div className="flex flex-wrap items-start gap-2">
        <label htmlFor="new-embed-code" className="sr-only">
          Embed code
        </label>
        <textarea id="new-embed-code" readOnly rows={3} value={code} onFocus={(e) => e.currentTarget.select()} className={`${fieldStyles.control} mt-0 min-w-72 flex-1 font-mono text-xs`} />
        <CopyButton url={code} label="Copy the embed code" words="Copy code" />
      </div>
    </div>
  );
}

function CreateLinkForm({ projectId, scenarioId, onCreated }: { projectId: string; scenarioId: string; onCreated: (link: ShareLinkDto, url: string) => void }) {
  const create = useCreateShareLink(projectId, scenarioId);
  const { form, problem, submit } = useApiForm(shareLinkCreateSchema, { defaultValues: { label: "", expiresInDays: null } });
  const { errors, isSubmitting } = form.formState;
  const onSubmit = submit(async (input) => {
    const { link, url } = await create.mutateAsync(input);
    form.reset({ label: "", expiresInDays: input.expiresInDays ?? null });
    onCreated(link, url);
  });
  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4 border-b border-rule pb-8">
      <div>
        <h2 className="font-serif text-xl font-semibold">New share link</h2>
        <p className="mt-1 text-sm text-ink-soft">
          Anyone with the link sees this scenario read-only, with its Diagram and Budget, and nothing else of the project; they can export the
          figure, the numbers and the scenario file. No account needed. The same link can be embedded in a page or a slide.
        </p>
      </div>
      <FormProblem problem={problem} />
      <div className="flex flex-wrap items-start gap-4">
        <TextField label="Label" placeholder="for the referee" autoComplete="off" className="min-w-64 flex-1" error={errors.label?.message} {...form.register("label")} />
        <SelectField
          label="Expires after"
          className="w-44"
          error={errors.expiresInDays?.message}
          {...form.register("expiresInDays", { setValueAs: (value: string | number | null) => (value === "" || value === null ? null : Number(value)) })}
        >
          {expiryChoices.map((choice) => (
            <option key={choice.label} value={choice.days ?? ""}>
              {choice.label}
            </option>
          ))}
        </SelectField>
        <button type="submit" disabled={isSubmitting} className={`${buttonStyles.primary} mt-6`}>
          {isSubmitting ? "Creating…" : "Create link"}
        </button>
      </div>
    </form>
  );
}

/**
 * A scenario's share links: make one (label, expiry), see each one's views, copy a new link's URL, revoke.
 * Only a hash of each token is stored, so a URL can be copied only in the visit that created it.
 */
export function ShareLinksPanel({ projectId, scenarioId }: { projectId: string; scenarioId: string }) {
  const links = useShareLinks(projectId, scenarioId);
  const revoke = useRevokeShareLink(projectId, scenarioId);
  const [urls, setUrls] = useState<Record<string, string>>({});
  const [latest, setLatest] = useState<{ label: string; url: string } | null>(null);
  const revoking = useRevokeConfirmation();

  return (
    <div className="space-y-10">
      <CreateLinkForm
        projectId={projectId}
        scenarioId={scenarioId}
        onCreated={(link, url) => {
          setUrls((known) => ({ ...known, [link.id]: url }));
          setLatest({ label: link.label, url });
        }}
      />

      {latest && (
        <Notice tone="success" onDismiss={() => setLatest(null)}>
          <p>
            The link “{latest.label}” is ready. Copy it now: Branchline keeps only a fingerprint of it and cannot show it again.
          </p>
          <div className="mt-2 flex flex-wrap items-center gap-2">
            <label htmlFor="new-share-url" className="sr-only">
              Share link URL
            </label>
            <input id="new-share-url" readOnly value={latest.url} onFocus={(e) => e.currentTarget.select()} className={`${fieldStyles.control} mt-0 min-w-72 flex-1 font-mono text-sm`} />
            <CopyButton url={latest.url} label="Copy the new link's URL" />
          </div>
          <EmbedCode url={latest.url} />
        </Notice>
      )}

      <section aria-labelledby="links-title" className="space-y-4">
        <h2 id="links-title" className="font-serif text-xl font-semibold">
          Links
        </h2>
        <QueryView query={links} what="the share links" lines={3}>
          {(list) =>
            list.length === 0 ? (
              <EmptyState title="No share links yet">Create one above to show this scenario to someone outside the project.</EmptyState>
            ) : (
              <table className={tableStyles.table}>
                <caption className="sr-only">Share links of this scenario, newest first</caption>
                <TableHead columns={columns} />
                <tbody>
                  {list.map((link) => {
                    const status = statusWords[link.status];
                    return (
                      <tr key={link.id} className={tableStyles.row}>
                        <td className={`${tableStyles.cell} font-semibold`}>{link.label}</td>
                        <td className={tableStyles.cell}>
                          <TimeStamp iso={link.createdAt} />
                          {link.createdBy && <span className="text-xs text-ink-faint">by {link.createdBy.name}</span>}
                        </td>
                        <td className={tableStyles.cell}>{link.expiresAt ? <TimeStamp iso={link.expiresAt} /> : <span className="text-ink-soft">never</span>}</td>
                        <td className={`${tableStyles.cell} tabular text-right`} title={link.lastViewedAt ? `last viewed ${link.lastViewedAt}` : "not viewed yet"}>
                          {link.viewCount}
                        </td>
                        <td className={`${tableStyles.cell} ${status.className}`}>
                          <span aria-hidden="true">{status.icon} </span>
                          {status.text}
                        </td>
                        <td className={`${tableStyles.cell} whitespace-nowrap text-right`}>
                          {link.status === "active" && urls[link.id] && (
                            <>
                              <CopyButton url={urls[link.id]} label={`Copy the URL of “${link.label}”`} />
                              <CopyButton url={embedCodeOf(urls[link.id])} label={`Copy the embed code of “${link.label}”`} words="Copy embed code" />
                            </>
                          )}
                          {link.status === "active" && <RevokeButton target={{ id: link.id, name: `“${link.label}”` }} onAsk={revoking.ask} />}
                        </td>
                      </tr>
                    );
                  })}
                </tbody>
              </table>
            )
          }
        </QueryView>
      </section>

      <RevokeDialog target={revoking.target} onClose={revoking.close} revoke={revoke} confirmLabel="Revoke link">
        Whoever has this link will get “not found” from now on. It stays listed here with its view count.
      </RevokeDialog>
    </div>
  );
}
