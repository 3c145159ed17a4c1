"use client";

import { useState } from "react";
import { useSetSiteRole, useUsers } from "@/components/api/admin";
import type { UserDto } from "@/components/api/account";
import { messageOf } from "@/components/api/client";
import { sentence } from "@/components/format/text";
import { Notice } from "@/components/ui/Notice";
import { QueryView } from "@/components/ui/QueryStates";
import { TimeStamp } from "@/components/ui/TimeStamp";
import { TableHead } from "@/components/ui/TableHead";
import { buttonStyles, fieldStyles, tableStyles } from "@/components/ui/styles";

type SiteRole = UserDto["siteRole"];

const userColumns = [{ label: "Name" }, { label: "E-mail" }, { label: "Site role" }, { label: "Signed up" }];

export function UserTable({ currentUserId }: { currentUserId: string }) {
  const users = useUsers();
  const setRole = useSetSiteRole();
  const [problem, setProblem] = useState<string | null>(null);

  return (
    <div className="space-y-4">
      {problem && (
        <Notice tone="caution" onDismiss={() => setProblem(null)}>
          {sentence(problem)}
        </Notice>
      )}
      <QueryView query={users} what="the users" lines={6}>
        {(list) => (
          <table className={tableStyles.table}>
            <caption className="sr-only">Everyone with a Branchline account</caption>
            <TableHead columns={userColumns} />
            <tbody>
              {list.map((user) => {
                const pending = setRole.isPending && setRole.variables?.userId === user.id ? setRole.variables.siteRole : null;
                return (
                  <tr key={user.id} className={tableStyles.row}>
                    <td className={`${tableStyles.cell} font-semibold`}>
                      {user.name}
                      {user.id === currentUserId && <span className="ml-2 font-normal text-ink-faint">(you)</span>}
                    </td>
                    <td className={`${tableStyles.cell} text-ink-soft`}>
                      {user.email}
                      {!user.emailVerifiedAt && <span className="ml-2 text-xs text-ink-faint">not confirmed</span>}
                    </td>
                    <td className={tableStyles.cell}>
                      <select
                        aria-label={`Site role of ${user.name}`}
                        value={pending ?? user.siteRole}
                        disabled={pending !== null}
                        onChange={(e) => {
                          setProblem(null);
                          setRole.mutate({ userId: user.id, siteRole: e.target.value as SiteRole }, { onError: (error) => setProblem(messageOf(error)) });
                        }}
                        className={`${fieldStyles.control} mt-0 w-40 py-1 text-sm`}
                      >
                        <option value="member">Member</option>
                        <option value="admin">Administrator</option>
                      </select>
                    </td>
                    <td className={tableStyles.cell}>
                      <TimeStamp iso={user.createdAt} />
                    </td>
                  </tr>
                );
              })}
            </tbody>
          </table>
        )}
      </QueryView>
    </div>
  );
}
