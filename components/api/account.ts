import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import type { UserDto } from "@/contracts/dto";
import { apiFetch } from "./client";
import { apiPaths } from "@/contracts/api-paths";

export type { UserDto };

export const accountKeys = { me: ["account"] as const };

export function useAccount() {
  return useQuery({
    queryKey: accountKeys.me,
    queryFn: () => apiFetch<{ user: UserDto }>(apiPaths.account).then((r) => r.user),
  });
}

export function useUpdateAccount() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: { name: string }) => apiFetch<{ user: UserDto }>(apiPaths.account, { method: "PATCH", json: input }).then((r) => r.user),
    onSuccess: (user) => queryClient.setQueryData(accountKeys.me, user),
  });
}

/** Ends every session of the account (this browser's too); the caller then clears its own cookie. */
export function useSignOutEverywhere() {
  return useMutation({
    mutationFn: () => apiFetch<void>(apiPaths.accountSessions, { method: "DELETE" }),
  });
}
