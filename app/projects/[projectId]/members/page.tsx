import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { signInPath } from "@/components/auth/callbackUrl";
import { MembersPanel } from "@/components/members/MembersPanel";
import { currentUser } from "@/lib/session";

export const metadata: Metadata = { title: "Members" };

export default async function MembersPage({ params }: { params: Promise<{ projectId: string }> }) {
  const { projectId } = await params;
  const user = await currentUser();
  if (!user) redirect(signInPath(`/projects/${projectId}/members`));
  return <MembersPanel projectId={projectId} currentUserId={user.id} />;
}
