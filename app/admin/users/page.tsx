import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { UserTable } from "@/components/admin/UserTable";
import { PageHeader } from "@/components/ui/PageHeader";
import { currentUser } from "@/lib/session";

export const metadata: Metadata = { title: "Users" };

/** Site administrators only; for everyone else the page does not exist. */
export default async function AdminUsersPage() {
  const user = await currentUser();
  if (user?.siteRole !== "admin") notFound();
  return (
    <>
      <PageHeader title="Users">Everyone with an account. Administrators may see this page and change site roles.</PageHeader>
      <UserTable currentUserId={user.id} />
    </>
  );
}
