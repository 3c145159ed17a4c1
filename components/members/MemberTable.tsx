"use client";

import type { MemberDto, ProjectRole } from "@/components/api/members";
import { roleNames } from "@/components/format/words";
import { TimeStamp } from "@/components/ui/TimeStamp";
import { TableHead } from "@/components/ui/TableHead";
import { buttonStyles, fieldStyles, tableStyles } from "@/components/ui/styles";

const roles = Object.keys(roleNames) as ProjectRole[];

const memberColumns = [{ label: "Name" }, { label: "E-mail" }, { label: "Role" }, { label: "Joined" }, { label: "Actions", hiddenLabel: true }];

interface MemberTableProps {
  projectName: string;
  members: MemberDto[];
  currentUserId: string;
  /** Owners get a role select and a remove button per row; everyone else sees roles as text. */
  manages: boolean;
  /** The role a member is being changed to right now, shown before the server confirms it. */
  pendingRole: { userId: string; role: ProjectRole } | null;
  onRoleChange: (member: MemberDto, role: ProjectRole) => void;
  onRemove: (member: MemberDto) => void;
  /** Hands the caller's ownership to this member (owners only). */
  onTransfer: (member: MemberDto) => void;
}

export function MemberTable({ projectName, members, currentUserId, manages, pendingRole, onRoleChange, onRemove, onTransfer }: MemberTableProps) {
  return (
    <table className={tableStyles.table}>
      <caption className="sr-only">Members of {projectName}</caption>
      <TableHead columns={memberColumns} />
      <tbody>
        {members.map((member) => {
          const isSelf = member.userId === currentUserId;
          const changingTo = pendingRole?.userId === member.userId ? pendingRole.role : null;
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
                    value={changingTo ?? member.role}
                    disabled={changingTo !== null}
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
              <td className={`${tableStyles.cell} whitespace-nowrap text-right`}>
                {manages && !isSelf && (
                  <button type="button" onClick={() => onTransfer(member)} className={buttonStyles.row} aria-label={`Make ${member.name} owner`}>
                    Make owner
                  </button>
                )}
                {(isSelf || manages) && (
                  <button type="button" onClick={() => onRemove(member)} className={buttonStyles.row}>
                    {isSelf ? "Leave project" : "Remove"}
                  </button>
                )}
              </td>
            </tr>
          );
        })}
      </tbody>
    </table>
  );
}
