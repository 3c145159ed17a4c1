"use client";

import { useState } from "react";
import { useSetSiteRole, useUsers } from "@/components/api/admin";
import type { UserDto } from "@/components/api/account";
import { messageOf } from "@/components/api/client";
import { sentence } from "@/components/format/text";
import { Notice } from "@/components/ui/Notice";
import { LoadError, Skeleton } from "@/components/ui/QueryStates";
import { TimeStamp } from "@/components/ui/TimeStamp";
import { buttonStyles, fieldStyles, tableStyles } from "@/components/ui/styles";

type SiteRole = UserDto["siteRole"];

export function UserTable({ currentUserId }: { currentUserId: string }) {
  const users = useUsers();
  const setRole = useSetSiteRole();
  const [problem, setProblem] = useState<string | null>(null);

  if (users.isPending) return <Skeleton lines={6} label="Loading users" />;
  if (users.isError) return <LoadError error={users.error} onRetry={() => users.refetch()} what="the users" />;

  return (
    <div className="space-y-4">
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
      <table className={tableStyles.table}>
        <caption className="sr-only">Everyone with a Branchline account</caption>
        <thead>
          <tr>
            <th scope="col" className={tableStyles.head}>
              Name
            </th>
            <th scope="col" className={tableStyles.head}>
              E-mail
            </th>
            <th scope="col" className={tableStyles.head}>
              Site role
            </th>
            <th scope="col" className={tableStyles.head}>
              Signed up
            </th>
          </tr>
        </thead>
        <tbody>
          {users.data.map((user) => {
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
    </div>
  );
}
