/**
 * Files sent to the API: scenario files, sequencer CSVs and attachments. Sent as multipart with a `file` field;
 * attachments through XMLHttpRequest, the one browser API that reports upload progress. Every failure is an ApiError
 * with the server's error shape, as everywhere else.
 */
import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import type { AttachmentDto, ScenarioDto } from "@/contracts/dto";
import type { ProfileFlag, SampledProtocol, SequencerSample, ColumnReading } from "@/canvas/import/sequencer-csv";
import { ApiError, apiFetch, errorFromBody } from "./client";
import { projectKeys } from "./projects";
import { scenarioKeys } from "./scenarios";
import { apiPaths } from "@/contracts/api-paths";

export type { AttachmentDto };


function errorOf(status: number, text: string): ApiError {
  let body: unknown;
  try {
    body = JSON.parse(text);
  } catch {
    body = undefined;
  }
  return errorFromBody(status, body);
}

/** POSTs a form, reporting the share of it sent (0 to 1). */
export function postForm<T>(path: string, form: FormData, onProgress?: (sent: number) => void): Promise<T> {
  return new Promise((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    xhr.open("POST", path);
    xhr.setRequestHeader("Accept", "application/json");
    xhr.withCredentials = true;
    xhr.upload.onprogress = (event) => {
      if (event.lengthComputable) onProgress?.(event.loaded / event.total);
    };
    xhr.onerror = () => reject(new ApiError(0, "network", "could not reach the server; check your connection and try again"));
    xhr.onload = () => {
      if (xhr.status >= 200 && xhr.status < 300) {
        try {
          resolve(JSON.parse(xhr.responseText) as T);
        } catch {
          reject(new ApiError(xhr.status, "unexpected", "the server's answer could not be read"));
        }
      } else reject(errorOf(xhr.status, xhr.responseText));
    };
    xhr.send(form);
  });
}

const fileForm = (file: File, fields: Record<string, string | undefined> = {}) => {
  const form = new FormData();
  form.set("file", file, file.name);
  for (const [key, value] of Object.entries(fields)) if (value !== undefined && value !== "") form.set(key, value);
  return form;
};

/** Imports a scenario file as a new scenario of the project. */
export function useImportScenario(projectId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (file: File) => postForm<{ scenario: ScenarioDto }>(apiPaths.scenarioImport(projectId), fileForm(file)).then((r) => r.scenario),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: projectKeys.one(projectId) }),
  });
}

export interface SequencerSettings {
  timeUnit?: string;
  separationUnit?: string;
  interpolation: SampledProtocol["interpolation"];
}

export interface SequencerProfileSummary {
  rowCount: number;
  durationSeconds: number;
  maxSeparationMetres: number;
  time: ColumnReading;
  separation: ColumnReading;
  flags: ProfileFlag[];
  preview: SequencerSample[];
}

/** Reads a sequencer CSV on the server and answers the profile, storing nothing. */
export function previewSequencerProfile(projectId: string, scenarioId: string, file: File, settings: SequencerSettings) {
  return postForm<{ profile: SequencerProfileSummary; protocol: SampledProtocol }>(
    apiPaths.sequencerProfile(projectId, scenarioId),
    fileForm(file, { ...settings, dryRun: "1" }),
  );
}

/** Saves the profile as the scenario's protocol: a new revision, if `version` is still the stored one (else 409). */
export function useSaveSequencerProfile(projectId: string, scenarioId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ file, settings, version }: { file: File; settings: SequencerSettings; version: number }) =>
      postForm<{ scenario: ScenarioDto }>(apiPaths.sequencerProfile(projectId, scenarioId), fileForm(file, { ...settings, version: String(version) })).then((r) => r.scenario),
    onSuccess: (scenario) => {
      queryClient.setQueryData(scenarioKeys.one(projectId, scenarioId), scenario);
      return queryClient.invalidateQueries({ queryKey: scenarioKeys.one(projectId, scenarioId) });
    },
  });
}

export const attachmentKeys = {
  all: (projectId: string, scenarioId: string) => [...scenarioKeys.one(projectId, scenarioId), "attachments"] as const,
};

export function useAttachments(projectId: string, scenarioId: string) {
  return useQuery({
    queryKey: attachmentKeys.all(projectId, scenarioId),
    queryFn: () => apiFetch<{ attachments: AttachmentDto[]; maxBytes: number }>(apiPaths.attachments(projectId, scenarioId)),
  });
}

export function useUploadAttachment(projectId: string, scenarioId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ file, onProgress }: { file: File; onProgress: (sent: number) => void }) =>
      postForm<{ attachment: AttachmentDto }>(apiPaths.attachments(projectId, scenarioId), fileForm(file), onProgress).then((r) => r.attachment),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: attachmentKeys.all(projectId, scenarioId) }),
  });
}

export function useDeleteAttachment(projectId: string, scenarioId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (attachmentId: string) => apiFetch<void>(apiPaths.attachment(projectId, scenarioId, attachmentId), { method: "DELETE" }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: attachmentKeys.all(projectId, scenarioId) }),
  });
}
