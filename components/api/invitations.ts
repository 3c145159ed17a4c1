import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import type { AuditEntryDto } from "@/db/audit";
import type { InvitationDto } from "@/db/invitations";
import type { MemberDto } from "@/db/members";
import { apiFetch } from "./client";
import { projectKeys } from "./projects";

export type { AuditEntryDto, InvitationDto };
export type InvitedRole = InvitationDto["role"];

export const invitationKeys = {
  all: (projectId: string) => [...projectKeys.one(projectId), "invitations"] as const,
  audit: (projectId: string) => [...projectKeys.one(projectId), "audit"] as const,
};

const base = (projectId: string) => `/api/projects/${encodeURIComponent(projectId)}`;
const one = (projectId: string, invitationId: string) => `${base(projectId)}/invitations/${encodeURIComponent(invitationId)}`;

export function useInvitations(projectId: string, enabled = true) {
  return useQuery({
    queryKey: invitationKeys.all(projectId),
    queryFn: () => apiFetch<{ invitations: InvitationDto[] }>(`${base(projectId)}/invitations`).then((r) => r.invitations),
    enabled,
  });
}

export function useAudit(projectId: string, enabled = true) {
  return useQuery({
    queryKey: invitationKeys.audit(projectId),
    queryFn: () => apiFetch<{ entries: AuditEntryDto[] }>(`${base(projectId)}/audit`).then((r) => r.entries),
    enabled,
  });
}

/** Every team change may touch members, invitations and the history, and the caller's own role: read the project again. */
function useInvalidateProject(projectId: string) {
  const queryClient = useQueryClient();
  return () => queryClient.invalidateQueries({ queryKey: projectKeys.one(projectId) });
}

export function useInvite(projectId: string) {
  const invalidate = useInvalidateProject(projectId);
  return useMutation({
    mutationFn: (input: { email: string; role: InvitedRole }) =>
      apiFetch<{ invitation: InvitationDto }>(`${base(projectId)}/invitations`, { method: "POST", json: input }).then((r) => r.invitation),
    onSuccess: invalidate,
  });
}

export function useResendInvitation(projectId: string) {
  const invalidate = useInvalidateProject(projectId);
  return useMutation({
    mutationFn: (invitationId: string) =>
      apiFetch<{ invitation: InvitationDto }>(`${one(projectId, invitationId)}/resend`, { method: "POST" }).then((r) => r.invitation),
    onSuccess: invalidate,
  });
}

export function useRevokeInvitation(projectId: string) {
  const invalidate = useInvalidateProject(projectId);
  return useMutation({
    mutationFn: (invitationId: string) => apiFetch<void>(one(projectId, invitationId), { method: "DELETE" }),
    onSuccess: invalidate,
  });
}

export function useTransferOwnership(projectId: string) {
  const invalidate = useInvalidateProject(projectId);
  return useMutation({
    mutationFn: (userId: string) =>
      apiFetch<{ members: MemberDto[] }>(`${base(projectId)}/ownership`, { method: "POST", json: { userId } }).then((r) => r.members),
    onSuccess: invalidate,
  });
}

export function useAcceptInvitation(token: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => apiFetch<{ projectId: string }>(`/api/invitations/${encodeURIComponent(token)}/accept`, { method: "POST" }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: projectKeys.all, exact: true }),
  });
}
