import { keepPreviousData, useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import type { RevisionSummaryDto, ScenarioDto, ScenarioPage, ScenarioSummaryDto } from "@/contracts/dto";
import type { z } from "zod";
import type { scenarioListQuerySchema } from "@/contracts/requests";
import type { ScenarioDocument } from "@/physics/scenario/schema";
import { apiFetch } from "./client";
import { projectKeys } from "./projects";
import { apiPaths } from "@/contracts/api-paths";

export type { RevisionSummaryDto, ScenarioDto, ScenarioPage, ScenarioSummaryDto };

/** The list query as the API reads it (after defaults): page, pageSize, sort, order, q?, background?. */
export type ScenarioListQuery = z.output<typeof scenarioListQuerySchema>;

export const scenarioKeys = {
  all: (projectId: string) => [...projectKeys.one(projectId), "scenarios"] as const,
  list: (projectId: string, query: ScenarioListQuery) => [...scenarioKeys.all(projectId), "list", query] as const,
  one: (projectId: string, scenarioId: string) => [...scenarioKeys.all(projectId), scenarioId] as const,
  revisions: (projectId: string, scenarioId: string) => [...scenarioKeys.one(projectId, scenarioId), "revisions"] as const,
};

const base = apiPaths.scenarios;
const one = apiPaths.scenario;

function listPath(projectId: string, query: ScenarioListQuery): string {
  const params = new URLSearchParams({
    page: String(query.page),
    pageSize: String(query.pageSize),
    sort: String(query.sort),
    order: String(query.order),
  });
  if (query.q) params.set("q", query.q);
  if (query.background) params.set("background", query.background);
  return `${base(projectId)}?${params}`;
}

export function useScenarioPage(projectId: string, query: ScenarioListQuery) {
  return useQuery({
    queryKey: scenarioKeys.list(projectId, query),
    queryFn: () => apiFetch<ScenarioPage>(listPath(projectId, query)),
    placeholderData: keepPreviousData,
  });
}

export function useScenario(projectId: string, scenarioId: string) {
  return useQuery({
    queryKey: scenarioKeys.one(projectId, scenarioId),
    queryFn: () => apiFetch<{ scenario: ScenarioDto }>(one(projectId, scenarioId)).then((r) => r.scenario),
  });
}

export function useRevisions(projectId: string, scenarioId: string) {
  return useQuery({
    queryKey: scenarioKeys.revisions(projectId, scenarioId),
    queryFn: () => apiFetch<{ revisions: RevisionSummaryDto[] }>(`${one(projectId, scenarioId)}/revisions`).then((r) => r.revisions),
  });
}

/** A change to a project's scenarios also changes the project's count and last-change time. */
function useInvalidateProject(projectId: string) {
  const queryClient = useQueryClient();
  return () =>
    Promise.all([
      queryClient.invalidateQueries({ queryKey: projectKeys.one(projectId) }),
      queryClient.invalidateQueries({ queryKey: projectKeys.all, exact: true }),
    ]);
}

export function useCreateScenario(projectId: string) {
  const invalidate = useInvalidateProject(projectId);
  return useMutation({
    mutationFn: (input: { title: string; document: ScenarioDocument }) =>
      apiFetch<{ scenario: ScenarioDto }>(base(projectId), { method: "POST", json: input }).then((r) => r.scenario),
    onSuccess: invalidate,
  });
}

export function useRenameScenario(projectId: string) {
  const invalidate = useInvalidateProject(projectId);
  return useMutation({
    mutationFn: ({ scenarioId, version, title }: { scenarioId: string; version: number; title: string }) =>
      apiFetch<{ scenario: ScenarioDto }>(one(projectId, scenarioId), { method: "PUT", json: { version, title } }).then((r) => r.scenario),
    onSuccess: invalidate,
  });
}

export function useDuplicateScenario(projectId: string) {
  const invalidate = useInvalidateProject(projectId);
  return useMutation({
    mutationFn: (scenarioId: string) =>
      apiFetch<{ scenario: ScenarioDto }>(`${one(projectId, scenarioId)}/duplicate`, { method: "POST", json: {} }).then((r) => r.scenario),
    onSuccess: invalidate,
  });
}

export function useDeleteScenario(projectId: string) {
  const invalidate = useInvalidateProject(projectId);
  return useMutation({
    mutationFn: (scenarioId: string) => apiFetch<void>(one(projectId, scenarioId), { method: "DELETE" }),
    onSuccess: invalidate,
  });
}
