"use client";

import { useQueryClient } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { messageOf } from "@/components/api/client";
import { useChangeMemberRole, useMembers, useRemoveMember, type MemberDto, type ProjectRole } from "@/components/api/members";
import { projectKeys, useProject } from "@/components/api/projects";
import { roleNames } from "@/components/format/words";
import { sentence } from "@/components/format/text";
import { ConfirmDialog } from "@/components/ui/ConfirmDialog";
import { Notice } from "@/components/ui/Notice";
import { LoadError, Skeleton } from "@/components/ui/QueryStates";
import { TimeStamp } from "@/components/ui/TimeStamp";
import { buttonStyles, fieldStyles, tableStyles } from "@/components/ui/styles";
import { AddMemberForm } from "./AddMemberForm";

const roles = Object.keys(roleNames) as ProjectRole[];

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
          <Notice
            tone="caution"
            action={
              <button type="button" onClick={() => setProblem(null)} className={`${buttonStyles.row} -my-1`}>
                Dismiss
              </button>
            }
          >
            {sentence(problem)}
          </Notice>
        )}
        {members.isPending ? (
          <Skeleton lines={4} label="Loading members" />
        ) : members.isError ? (
          <LoadError error={members.error} onRetry={() => members.refetch()} what="the members" />
        ) : (
          <table className={tableStyles.table}>
            <caption className="sr-only">Members of {project.name}</caption>
            <thead>
              <tr>
                <th scope="col" className={tableStyles.head}>
                  Name
                </th>
                <th scope="col" className={tableStyles.head}>
                  E-mail
                </th>
                <th scope="col" className={tableStyles.head}>
                  Role
                </th>
                <th scope="col" className={tableStyles.head}>
                  Joined
                </th>
                <th scope="col" className={tableStyles.head}>
                  <span className="sr-only">Actions</span>
                </th>
              </tr>
            </thead>
            <tbody>
              {members.data.map((member) => {
                const isSelf = member.userId === currentUserId;
                const pendingRole = changeRole.isPending && changeRole.variables?.userId === member.userId ? changeRole.variables.role : null;
                return (
                  <tr key={member.userId} className={tableStyles.row}>
                    <td className={`${tableStyles.cell} font-semibold`}>
                      {member.name}
                      {isSelf && <span className="ml-2 font-normal text-ink-faint">(you)</span>}
                    </td>
                    <td className={`${tableStyles.cell} text-ink-soft`}>{member.email}</td>
                    <td className={tableStyles.cell}>
                      {manages ? (
                        <select
                          aria-label={`Role of ${member.name}`}
                          value={pendingRole ?? member.role}
                          disabled={pendingRole !== null}
                          onChange={(e) => onRoleChange(member, e.target.value as ProjectRole)}
                          className={`${fieldStyles.control} mt-0 w-32 py-1 text-sm`}
                        >
                          {roles.map((role) => (
                            <option key={role} value={role}>
                              {roleNames[role]}
                            </option>
                          ))}
                        </select>
                      ) : (
                        roleNames[member.role]
                      )}
                    </td>
                    <td className={tableStyles.cell}>
                      <TimeStamp iso={member.joinedAt} />
                    </td>
                    <td className={`${tableStyles.cell} text-right`}>
                      {isSelf ? (
                        <button type="button" onClick={() => setRemoving(member)} className={buttonStyles.row}>
                          Leave project
                        </button>
                      ) : (
                        manages && (
                          <button type="button" onClick={() => setRemoving(member)} className={buttonStyles.row}>
                            Remove
                          </button>
                        )
                      )}
                    </td>
                  </tr>
                );
              })}
            </tbody>
          </table>
        )}
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
