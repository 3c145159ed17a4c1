"use client";

import type { ReactNode } from "react";
import { useAudit, type AuditEntryDto } from "@/components/api/invitations";
import { roleNames } from "@/components/format/words";
import { EmptyState } from "@/components/ui/EmptyState";
import { QueryView } from "@/components/ui/QueryStates";
import { TimeStamp } from "@/components/ui/TimeStamp";

const role = (r: AuditEntryDto["role"]) => (r ? roleNames[r].toLowerCase() : "a member");

function Who({ children }: { children: ReactNode }) {
  return <span className="font-semibold text-ink">{children}</span>;
}

/** A scenario by its title now, "a deleted scenario" once it is gone. */
function Scenario({ entry }: { entry: AuditEntryDto }) {
  return entry.scenario ? <Who>{entry.scenario.title}</Who> : <>a deleted scenario</>;
}

/** One entry in words; a deleted account is "a former member", its address kept for the entry's target. */
function describe(entry: AuditEntryDto): ReactNode {
  const actor = <Who>{entry.actor?.name ?? "a former member"}</Who>;
  const target = <Who>{entry.target?.name ?? entry.target?.email ?? "someone"}</Who>;
  const subject = <Who>“{entry.subject ?? "untitled"}”</Who>;
  switch (entry.action) {
    case "member_added":
      return <>{actor} added {target} as {role(entry.role)}</>;
    case "invited":
      return <>{actor} invited {target} as {role(entry.role)}</>;
    case "invitation_resent":
      return <>{actor} sent the invitation to {target} again</>;
    case "invitation_revoked":
      return <>{actor} revoked the invitation to {target}</>;
    case "invitation_accepted":
      return <>{target} accepted the invitation and joined as {role(entry.role)}</>;
    case "role_changed":
      return <>{actor} changed {target} from {role(entry.previousRole)} to {role(entry.role)}</>;
    case "member_removed":
      return <>{actor} removed {target} ({role(entry.previousRole)})</>;
    case "member_left":
      return <>{target} left the project</>;
    case "ownership_transferred":
      return <>{actor} handed ownership to {target} and became an editor</>;
    case "share_link_created":
      return <>{actor} made the share link {subject} for <Scenario entry={entry} /></>;
    case "share_link_revoked":
      return <>{actor} revoked the share link {subject} of <Scenario entry={entry} /></>;
    case "attachment_added":
      return <>{actor} attached {subject} to <Scenario entry={entry} /></>;
    case "attachment_deleted":
      return <>{actor} deleted the file {subject} from <Scenario entry={entry} /></>;
    case "scenario_imported":
      return <>{actor} imported <Scenario entry={entry} /> from the file {subject}</>;
  }
}

/** Who changed the membership, the share links and the files, how and when, newest first (owners only). */
export function AuditLog({ projectId }: { projectId: string }) {
  const audit = useAudit(projectId);
  return (
    <section aria-labelledby="audit-title" className="space-y-4">
      <h2 id="audit-title" className="font-serif text-xl font-semibold">
        Project history
      </h2>
      <QueryView query={audit} what="the project history" lines={3}>
        {(entries) =>
          entries.length === 0 ? (
            <EmptyState title="No changes yet" />
          ) : (
            <>
            <ol className="divide-y divide-rule border-y border-rule text-sm" aria-label="Changes to the project, newest first">
              {entries.map((entry) => (
                <li key={entry.id} className="flex flex-wrap items-baseline justify-between gap-x-6 gap-y-1 py-2" data-action={entry.action}>
                  <span className="text-ink-soft">{describe(entry)}</span>
                  <TimeStamp iso={entry.at} layout="inline" />
                </li>
              ))}
            </ol>
            {entries.length >= 100 && <p className="text-sm text-ink-faint">The latest {entries.length} changes are shown.</p>}
            </>
          )
        }
      </QueryView>
    </section>
  );
}
