/**
 * Edits of the scenario document as pure functions (document in, new document out, untouched parts shared), and
 * the check every edit passes before the store accepts it: the schema, then the background (a lab on or inside
 * a horizon is refused with the path of the offending field).
 */
import { BackgroundInputError, makeBackground } from "@/physics/backgrounds";
import { parseScenarioDocument, type ScenarioDocument, type SchemaIssue } from "@/physics/scenario/schema";
import type { ProtocolPlan } from "./lab-view/drag-plan";
import type { SegmentName } from "./timeline";

export function withProtocolPlan(document: ScenarioDocument, plan: ProtocolPlan): ScenarioDocument {
  if (document.protocol.kind !== "segments") return document;
  const p = document.protocol;
  return {
    ...document,
    separation:
      plan.distanceMetres === document.separation.distanceMetres ? document.separation : { ...document.separation, distanceMetres: plan.distanceMetres },
    protocol: {
      ...p,
      separation: plan.separationSeconds === p.separation.durationSeconds ? p.separation : { ...p.separation, durationSeconds: plan.separationSeconds },
      hold: plan.holdSeconds === p.hold.durationSeconds ? p.hold : { ...p.hold, durationSeconds: plan.holdSeconds },
      recombination:
        plan.recombinationSeconds === p.recombination.durationSeconds ? p.recombination : { ...p.recombination, durationSeconds: plan.recombinationSeconds },
    },
  };
}

export function withSegmentDuration(document: ScenarioDocument, segment: SegmentName, seconds: number): ScenarioDocument {
  if (document.protocol.kind !== "segments") return document;
  return { ...document, protocol: { ...document.protocol, [segment]: { ...document.protocol[segment], durationSeconds: seconds } } };
}

/** Every problem with a document, each with its dotted path; empty when the editor may accept it. */
export function documentIssues(document: ScenarioDocument): SchemaIssue[] {
  const parsed = parseScenarioDocument(document);
  if (!parsed.ok) return parsed.issues;
  try {
    makeBackground(parsed.document.background, parsed.document.lab);
  } catch (error) {
    if (error instanceof BackgroundInputError) return [{ path: error.path, message: error.message }];
    throw error;
  }
  return [];
}
