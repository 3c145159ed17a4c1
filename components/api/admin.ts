import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import type { UserDto } from "@/db/users";
import { apiFetch } from "./client";

export const adminKeys = { users: ["admin", "users"] as const };

export function useUsers() {
  return useQuery({
    queryKey: adminKeys.users,
    queryFn: () => apiFetch<{ users: UserDto[] }>("/api/admin/users").then((r) => r.users),
  });
}

export function useSetSiteRole() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ userId, siteRole }: { userId: string; siteRole: UserDto["siteRole"] }) =>
      apiFetch<{ user: UserDto }>(`/api/admin/users/${encodeURIComponent(userId)}`, { method: "PATCH", json: { siteRole } }).then((r) => r.user),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: adminKeys.users }),
  });
}
