import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import type { MemberDto } from "@/contracts/dto";
import { apiFetch } from "./client";
import { projectKeys } from "./projects";
import { apiPaths } from "@/contracts/api-paths";

export type { MemberDto };
export type ProjectRole = MemberDto["role"];

export const memberKeys = {
  all: (projectId: string) => [...projectKeys.one(projectId), "members"] as const,
};

const base = apiPaths.members;
const one = apiPaths.member;

export function useMembers(projectId: string) {
  return useQuery({
    queryKey: memberKeys.all(projectId),
    queryFn: () => apiFetch<{ members: MemberDto[] }>(base(projectId)).then((r) => r.members),
  });
}

/** Role changes may change what the caller may do (their own role), so the project is read again too. */
function useInvalidateMembers(projectId: string) {
  const queryClient = useQueryClient();
  return () => queryClient.invalidateQueries({ queryKey: projectKeys.one(projectId) });
}

export function useChangeMemberRole(projectId: string) {
  const invalidate = useInvalidateMembers(projectId);
  return useMutation({
    mutationFn: ({ userId, role }: { userId: string; role: ProjectRole }) =>
      apiFetch<{ member: MemberDto }>(one(projectId, userId), { method: "PATCH", json: { role } }).then((r) => r.member),
    onSuccess: invalidate,
  });
}

export function useRemoveMember(projectId: string) {
  const invalidate = useInvalidateMembers(projectId);
  return useMutation({
    mutationFn: (userId: string) => apiFetch<void>(one(projectId, userId), { method: "DELETE" }),
    onSuccess: invalidate,
  });
}
