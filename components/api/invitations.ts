import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import type { AuditEntryDto, InvitationDto, MemberDto } from "@/contracts/dto";
import { apiFetch } from "./client";
import { projectKeys } from "./projects";
import { apiPaths } from "@/contracts/api-paths";

export type { AuditEntryDto, InvitationDto };
export type InvitedRole = InvitationDto["role"];

export const invitationKeys = {
  all: (projectId: string) => [...projectKeys.one(projectId), "invitations"] as const,
  audit: (projectId: string) => [...projectKeys.one(projectId), "audit"] as const,
};

const one = apiPaths.invitation;

export function useInvitations(projectId: string, enabled = true) {
  return useQuery({
    queryKey: invitationKeys.all(projectId),
    queryFn: () => apiFetch<{ invitations: InvitationDto[] }>(apiPaths.invitations(projectId)).then((r) => r.invitations),
    enabled,
  });
}

export function useAudit(projectId: string, enabled = true) {
  return useQuery({
    queryKey: invitationKeys.audit(projectId),
    queryFn: () => apiFetch<{ entries: AuditEntryDto[] }>(apiPaths.audit(projectId)).then((r) => r.entries),
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
      apiFetch<{ invitation: InvitationDto }>(apiPaths.invitations(projectId), { method: "POST", json: input }).then((r) => r.invitation),
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
      apiFetch<{ members: MemberDto[] }>(apiPaths.ownership(projectId), { method: "POST", json: { userId } }).then((r) => r.members),
    onSuccess: invalidate,
  });
}

export function useAcceptInvitation(token: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => apiFetch<{ projectId: string }>(apiPaths.acceptInvitation(token), { method: "POST" }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: projectKeys.all, exact: true }),
  });
}
