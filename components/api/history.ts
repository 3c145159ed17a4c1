import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import type { RevisionDiffDto, RevisionDto, ScenarioDto } from "@/contracts/dto";
import { apiFetch } from "./client";
import { scenarioKeys } from "./scenarios";
import { projectKeys } from "./projects";
import { apiPaths } from "@/contracts/api-paths";

export type { RevisionDiffDto, RevisionDto };

const revisionPath = apiPaths.revision;

/** One stored revision; revisions never change, so it is never fetched twice. */
export function useRevision(projectId: string, scenarioId: string, version: number | null) {
  return useQuery({
    queryKey: [...scenarioKeys.revisions(projectId, scenarioId), version] as const,
    queryFn: () => apiFetch<{ revision: RevisionDto }>(revisionPath(projectId, scenarioId, version!)).then((r) => r.revision),
    enabled: version !== null,
    staleTime: Infinity,
  });
}

export function useRevisionDiff(projectId: string, scenarioId: string, against: number | null, version: number | null) {
  return useQuery({
    queryKey: [...scenarioKeys.revisions(projectId, scenarioId), "diff", against, version] as const,
    queryFn: () =>
      apiFetch<{ diff: RevisionDiffDto }>(`${revisionPath(projectId, scenarioId, version!)}/diff?against=${against}`).then((r) => r.diff),
    enabled: against !== null && version !== null,
    staleTime: Infinity,
  });
}

/** Restoring adds a version: the scenario, its revisions and the project's last change are all new. */
export function useRestoreRevision(projectId: string, scenarioId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (version: number) =>
      apiFetch<{ scenario: ScenarioDto }>(`${revisionPath(projectId, scenarioId, version)}/restore`, { method: "POST" }).then((r) => r.scenario),
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: scenarioKeys.one(projectId, scenarioId) }),
        queryClient.invalidateQueries({ queryKey: projectKeys.all, exact: true }),
      ]),
  });
}
