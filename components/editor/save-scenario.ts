/** The editor's three calls to the scenario API: save with the version edited, reload, and keep mine as a copy. */
import { apiFetch } from "@/components/api/client";
import type { ScenarioDto } from "@/components/api/scenarios";
import type { ScenarioDocument } from "@/physics/scenario/schema";
import { apiPaths } from "@/contracts/api-paths";

const scenarioPath = apiPaths.scenario;

export function putScenarioDocument(projectId: string, scenarioId: string, version: number, document: ScenarioDocument) {
  return apiFetch<{ scenario: ScenarioDto }>(scenarioPath(projectId, scenarioId), { method: "PUT", json: { version, document } }).then((r) => r.scenario);
}

export function getScenario(projectId: string, scenarioId: string) {
  return apiFetch<{ scenario: ScenarioDto }>(scenarioPath(projectId, scenarioId)).then((r) => r.scenario);
}

/** Duplicate the scenario as the server has it, then save my document into the copy: nobody's work is overwritten. */
export async function keepMineAsNewScenario(projectId: string, scenarioId: string, title: string, document: ScenarioDocument) {
  const copy = await apiFetch<{ scenario: ScenarioDto }>(`${scenarioPath(projectId, scenarioId)}/duplicate`, {
    method: "POST",
    json: { title },
  }).then((r) => r.scenario);
  return putScenarioDocument(projectId, copy.id, copy.version, document);
}
