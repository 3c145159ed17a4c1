"use client";

import { useQueryClient } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { messageOf } from "@/components/api/client";
import { useTransferOwnership } from "@/components/api/invitations";
import { useChangeMemberRole, useMembers, useRemoveMember, type MemberDto, type ProjectRole } from "@/components/api/members";
import { projectKeys, useProject } from "@/components/api/projects";
import { sentence } from "@/components/format/text";
import { ScenarioSharingIndex } from "@/components/sharing/ScenarioSharingIndex";
import { ConfirmDialog } from "@/components/ui/ConfirmDialog";
import { Notice } from "@/components/ui/Notice";
import { QueryView } from "@/components/ui/QueryStates";
import { AuditLog } from "./AuditLog";
import { InvitationTable } from "./InvitationTable";
import { InviteForm } from "./InviteForm";
import { MemberTable } from "./MemberTable";

/** The members tab. The project itself is loaded (and its 404 handled) by the frame around it. */
export function MembersPanel({ projectId, currentUserId }: { projectId: string; currentUserId: string }) {
  const router = useRouter();
  const queryClient = useQueryClient();
  const { data: project } = useProject(projectId);
  const members = useMembers(projectId);
  const changeRole = useChangeMemberRole(projectId);
  const remove = useRemoveMember(projectId);
  const transfer = useTransferOwnership(projectId);
  const [removing, setRemoving] = useState<MemberDto | null>(null);
  const [handingTo, setHandingTo] = useState<MemberDto | null>(null);
  const [problem, setProblem] = useState<string | null>(null);

  if (!project) return null;
  const manages = project.can.includes("members:manage");
  const invites = project.can.includes("members:invite");
  const leaving = removing?.userId === currentUserId;

  const onRoleChange = (member: MemberDto, role: ProjectRole) => {
    setProblem(null);
    changeRole.mutate({ userId: member.userId, role }, { onError: (error) => setProblem(messageOf(error)) });
  };

  const confirmRemove = () => {
    if (!removing) return;
    remove.mutate(removing.userId, {
      onSuccess: async () => {
        setRemoving(null);
        if (leaving) {
          await queryClient.invalidateQueries({ queryKey: projectKeys.all, exact: true });
          router.push("/projects");
        }
      },
    });
  };

  return (
    <div className="space-y-12">
      {invites && <InviteForm projectId={projectId} />}

      <section aria-labelledby="members-title" className="space-y-4">
        <h2 id="members-title" className="font-serif text-xl font-semibold">
          Members
        </h2>
        {problem && (
          <Notice tone="caution" onDismiss={() => setProblem(null)}>
            {sentence(problem)}
          </Notice>
        )}
        <QueryView query={members} what="the members">
          {(list) => (
            <MemberTable
              projectName={project.name}
              members={list}
              currentUserId={currentUserId}
              manages={manages}
              pendingRole={changeRole.isPending ? changeRole.variables : null}
              onRoleChange={onRoleChange}
              onRemove={setRemoving}
              onTransfer={setHandingTo}
            />
          )}
        </QueryView>
        <p className="text-sm text-ink-faint">
          Owners manage members and may rename or delete the project; editors change scenarios and make share links; viewers
          only look. A project always keeps at least one owner.
        </p>
      </section>

      {invites && <InvitationTable projectId={projectId} />}
      <ScenarioSharingIndex project={project} />
      {project.can.includes("members:audit") && <AuditLog projectId={projectId} />}

      <ConfirmDialog
        open={removing !== null}
        title={leaving ? `Leave “${project.name}”?` : `Remove ${removing?.name ?? ""} from “${project.name}”?`}
        confirmLabel={leaving ? "Leave project" : "Remove member"}
        pending={remove.isPending}
        error={remove.isError ? sentence(messageOf(remove.error)) : null}
        onCancel={() => {
          setRemoving(null);
          remove.reset();
        }}
        onConfirm={confirmRemove}
      >
        {leaving
          ? "You will no longer see this project or its scenarios, unless an owner adds you again."
          : "They will no longer see this project or its scenarios. Their past changes stay in the revisions."}
      </ConfirmDialog>

      <ConfirmDialog
        open={handingTo !== null}
        title={`Make ${handingTo?.name ?? ""} owner of “${project.name}”?`}
        confirmLabel="Make owner"
        pending={transfer.isPending}
        error={transfer.isError ? sentence(messageOf(transfer.error)) : null}
        onCancel={() => {
          setHandingTo(null);
          transfer.reset();
        }}
        onConfirm={() => handingTo && transfer.mutate(handingTo.userId, { onSuccess: () => setHandingTo(null) })}
      >
        They become an owner and you become an editor: you will no longer manage members or invitations, unless an owner
        makes you an owner again.
      </ConfirmDialog>
    </div>
  );
}
