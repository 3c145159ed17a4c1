import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import type { ShareLinkDto } from "@/contracts/dto";
import { apiFetch } from "./client";
import { scenarioKeys } from "./scenarios";
import { apiPaths } from "@/contracts/api-paths";

export type { ShareLinkDto };

export const shareLinkKeys = {
  all: (projectId: string, scenarioId: string) => [...scenarioKeys.one(projectId, scenarioId), "share-links"] as const,
};

const base = apiPaths.shareLinks;

export function useShareLinks(projectId: string, scenarioId: string) {
  return useQuery({
    queryKey: shareLinkKeys.all(projectId, scenarioId),
    queryFn: () => apiFetch<{ links: ShareLinkDto[] }>(base(projectId, scenarioId)).then((r) => r.links),
  });
}

/** Answers the new link and its URL: the only time the URL exists outside the e-mail or chat it is pasted into. */
export function useCreateShareLink(projectId: string, scenarioId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: { label: string; expiresInDays?: number | null }) =>
      apiFetch<{ link: ShareLinkDto; url: string }>(base(projectId, scenarioId), { method: "POST", json: input }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: shareLinkKeys.all(projectId, scenarioId) }),
  });
}

export function useRevokeShareLink(projectId: string, scenarioId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (linkId: string) => apiFetch<void>(apiPaths.shareLink(projectId, scenarioId, linkId), { method: "DELETE" }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: shareLinkKeys.all(projectId, scenarioId) }),
  });
}
