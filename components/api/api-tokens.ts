import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import type { ApiTokenDto, ApiTokenScope } from "@/contracts/dto";
import { apiFetch } from "./client";
import { accountKeys } from "./account";

export type { ApiTokenDto, ApiTokenScope };

export const apiTokenKeys = { all: [...accountKeys.me, "tokens"] as const };

export function useApiTokens() {
  return useQuery({
    queryKey: apiTokenKeys.all,
    queryFn: () => apiFetch<{ tokens: ApiTokenDto[] }>("/api/account/tokens").then((r) => r.tokens),
  });
}

export interface ApiTokenRequest {
  name: string;
  scope: ApiTokenScope;
  projectId?: string | null;
  expiresInDays: number | null;
}

/** Answers the new token itself: the only time it exists outside the script it is pasted into. */
export function useCreateApiToken() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: ApiTokenRequest) => apiFetch<{ token: string; apiToken: ApiTokenDto }>("/api/account/tokens", { method: "POST", json: input }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: apiTokenKeys.all }),
  });
}

export function useRevokeApiToken() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (tokenId: string) => apiFetch<void>(`/api/account/tokens/${encodeURIComponent(tokenId)}`, { method: "DELETE" }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: apiTokenKeys.all }),
  });
}
