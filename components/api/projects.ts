import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import type { ProjectDto } from "@/contracts/dto";
import { apiFetch } from "./client";
import { apiPaths } from "@/contracts/api-paths";

export type { ProjectDto };
export type ProjectAction = ProjectDto["can"][number];

export const projectKeys = {
  all: ["projects"] as const,
  one: (projectId: string) => ["projects", projectId] as const,
};

export function useProjects() {
  return useQuery({
    queryKey: projectKeys.all,
    queryFn: () => apiFetch<{ projects: ProjectDto[] }>(apiPaths.projects).then((r) => r.projects),
  });
}

export function useProject(projectId: string) {
  return useQuery({
    queryKey: projectKeys.one(projectId),
    queryFn: () => apiFetch<{ project: ProjectDto }>(apiPaths.project(projectId)).then((r) => r.project),
  });
}

export function useCreateProject() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: { name: string; description?: string }) =>
      apiFetch<{ project: ProjectDto }>(apiPaths.projects, { method: "POST", json: input }).then((r) => r.project),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: projectKeys.all }),
  });
}

export function useUpdateProject(projectId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: { name?: string; description?: string }) =>
      apiFetch<{ project: ProjectDto }>(apiPaths.project(projectId), { method: "PATCH", json: input }).then((r) => r.project),
    onSuccess: (project) => {
      queryClient.setQueryData(projectKeys.one(projectId), project);
      return queryClient.invalidateQueries({ queryKey: projectKeys.all, exact: true });
    },
  });
}

export function useDeleteProject(projectId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => apiFetch<void>(apiPaths.project(projectId), { method: "DELETE" }),
    // The project's own entry is left alone: the page that showed it is navigating away.
    onSuccess: () => queryClient.invalidateQueries({ queryKey: projectKeys.all, exact: true }),
  });
}
