import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import type { UserDto } from "@/contracts/dto";
import { apiFetch } from "./client";
import { apiPaths } from "@/contracts/api-paths";

export const adminKeys = { users: ["admin", "users"] as const };

export function useUsers() {
  return useQuery({
    queryKey: adminKeys.users,
    queryFn: () => apiFetch<{ users: UserDto[] }>(apiPaths.adminUsers).then((r) => r.users),
  });
}

export function useSetSiteRole() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ userId, siteRole }: { userId: string; siteRole: UserDto["siteRole"] }) =>
      apiFetch<{ user: UserDto }>(apiPaths.adminUser(userId), { method: "PATCH", json: { siteRole } }).then((r) => r.user),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: adminKeys.users }),
  });
}
