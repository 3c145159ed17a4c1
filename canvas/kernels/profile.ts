/** Any protocol as the physics library reads it: the separation history, and the branch paths sampled from it. */
import { sampleBranchPaths, separationHistory, type SeparationHistory } from "@/physics/protocols";
import { ScenarioInputError } from "@/physics/scenario/input-error";
import type { ScenarioDocument } from "@/physics/scenario/schema";

/** The history of a document's protocol, or null when it cannot be read (a formula that does not parse, say). */
export function profileHistory(document: Pick<ScenarioDocument, "protocol" | "separation">): SeparationHistory | null {
  try {
    return separationHistory(document);
  } catch (error) {
    if (error instanceof ScenarioInputError) return null;
    throw error;
  }
}

export function profilePaths(document: Pick<ScenarioDocument, "protocol" | "separation">, count: number) {
  const history = profileHistory(document);
  return history ? sampleBranchPaths(history, document.separation.split, count) : [];
}
