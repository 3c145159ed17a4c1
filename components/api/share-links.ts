import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import type { ShareLinkDto } from "@/db/share-links";
import { apiFetch } from "./client";
import { scenarioKeys } from "./scenarios";

export type { ShareLinkDto };

export const shareLinkKeys = {
  all: (projectId: string, scenarioId: string) => [...scenarioKeys.one(projectId, scenarioId), "share-links"] as const,
};

const base = (projectId: string, scenarioId: string) =>
  `/api/projects/${encodeURIComponent(projectId)}/scenarios/${encodeURIComponent(scenarioId)}/share-links`;

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
    mutationFn: (linkId: string) => apiFetch<void>(`${base(projectId, scenarioId)}/${encodeURIComponent(linkId)}`, { method: "DELETE" }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: shareLinkKeys.all(projectId, scenarioId) }),
  });
}
