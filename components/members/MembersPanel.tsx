"use client";

import { useQueryClient } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { messageOf } from "@/components/api/client";
import { useChangeMemberRole, useMembers, useRemoveMember, type MemberDto, type ProjectRole } from "@/components/api/members";
import { projectKeys, useProject } from "@/components/api/projects";
import { sentence } from "@/components/format/text";
import { ConfirmDialog } from "@/components/ui/ConfirmDialog";
import { Notice } from "@/components/ui/Notice";
import { QueryView } from "@/components/ui/QueryStates";
import { AddMemberForm } from "./AddMemberForm";
import { MemberTable } from "./MemberTable";

/** The members tab. The project itself is loaded (and its 404 handled) by the frame around it. */
export function MembersPanel({ projectId, currentUserId }: { projectId: string; currentUserId: string }) {
  const router = useRouter();
  const queryClient = useQueryClient();
  const { data: project } = useProject(projectId);
  const members = useMembers(projectId);
  const changeRole = useChangeMemberRole(projectId);
  const remove = useRemoveMember(projectId);
  const [removing, setRemoving] = useState<MemberDto | null>(null);
  const [problem, setProblem] = useState<string | null>(null);

  if (!project) return null;
  const manages = project.can.includes("members:manage");
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
    <div className="space-y-10">
      {manages && <AddMemberForm projectId={projectId} />}

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
            />
          )}
        </QueryView>
        <p className="text-sm text-ink-faint">
          Owners manage members and may rename or delete the project; editors change scenarios; viewers only look. A project
          always keeps at least one owner.
        </p>
      </section>

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
    </div>
  );
}
