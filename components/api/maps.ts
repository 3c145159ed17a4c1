import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import type { ParameterMapDto, ParameterMapSummary } from "@/contracts/dto";
import type { z } from "zod";
import type { mapCreateSchema } from "@/contracts/requests";
import { apiPaths } from "@/contracts/api-paths";
import { apiFetch } from "./client";

export type { ParameterMapDto, ParameterMapSummary };
export type MapCreateBody = z.input<typeof mapCreateSchema>;

/** How often a queued or running map is asked for its progress. */
const POLL_MS = 1000;

export const mapKeys = {
  one: (mapId: string) => ["maps", mapId] as const,
  ofScenario: (projectId: string, scenarioId: string) => ["maps", "scenario", projectId, scenarioId] as const,
};

const isActive = (status: ParameterMapSummary["status"] | undefined) => status === "queued" || status === "running";

export function useScenarioMaps(projectId: string, scenarioId: string) {
  return useQuery({
    queryKey: mapKeys.ofScenario(projectId, scenarioId),
    queryFn: () => apiFetch<{ maps: ParameterMapSummary[] }>(apiPaths.scenarioMaps(projectId, scenarioId)).then((r) => r.maps),
  });
}

/** One map, asked again every second while it is queued or running. */
export function useParameterMap(mapId: string | null) {
  return useQuery({
    queryKey: mapKeys.one(mapId ?? ""),
    queryFn: () => apiFetch<{ map: ParameterMapDto }>(apiPaths.map(mapId!)).then((r) => r.map),
    enabled: mapId !== null,
    refetchInterval: (query) => (isActive(query.state.data?.status) ? POLL_MS : false),
  });
}

export function useStartMap(projectId: string, scenarioId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: MapCreateBody) => apiFetch<{ map: ParameterMapDto }>(apiPaths.maps, { method: "POST", json: body }).then((r) => r.map),
    onSuccess: (map) => {
      queryClient.setQueryData(mapKeys.one(map.id), map);
      void queryClient.invalidateQueries({ queryKey: mapKeys.ofScenario(projectId, scenarioId) });
    },
  });
}

export function useCancelMap(projectId: string, scenarioId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (mapId: string) => apiFetch<{ map: ParameterMapSummary } | undefined>(apiPaths.map(mapId), { method: "DELETE" }),
    onSuccess: (_answer, mapId) => {
      void queryClient.invalidateQueries({ queryKey: mapKeys.one(mapId) });
      void queryClient.invalidateQueries({ queryKey: mapKeys.ofScenario(projectId, scenarioId) });
    },
  });
}
