/**
 * Edits of the scenario document as pure functions (document in, new document out, untouched parts shared), and
 * the check every edit passes before the store accepts it: the schema, then the background (a lab on or inside
 * a horizon is refused with the path of the offending field), then a profile formula (one the physics cannot
 * read or evaluate is refused with its reason).
 */
import { BackgroundInputError, makeBackground } from "@/physics/backgrounds";
import { separationHistory } from "@/physics/protocols";
import { ScenarioInputError } from "@/physics/scenario/input-error";
import { startingBackground } from "@/physics/scenario/starting";
import type { SampledProtocol } from "../import/sequencer-csv";
import { parseScenarioDocument, type LabPlacement, type RampShape, type ScenarioDocument, type SchemaIssue } from "@/physics/scenario/schema";
import type { ProtocolPlan } from "./offsets/drag-plan";
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
  if (parsed.document.protocol.kind === "formula") {
    try {
      separationHistory(parsed.document);
    } catch (error) {
      if (error instanceof ScenarioInputError) return [{ path: error.path, message: error.message }];
      throw error;
    }
  }
  return [];
}

/** A formula profile with a new expression or duration (a document of another protocol kind is left as it is). */
export function withFormula(document: ScenarioDocument, change: { expression?: string; durationSeconds?: number }): ScenarioDocument {
  if (document.protocol.kind !== "formula") return document;
  return { ...document, protocol: { ...document.protocol, ...change } };
}

/** A fresh start for each background (physics/scenario/starting.ts), keeping the source, separation and protocol. */
export function withBackgroundKind(document: ScenarioDocument, kind: ScenarioDocument["background"]["kind"]): ScenarioDocument {
  if (document.background.kind === kind) return document;
  return { ...document, ...startingBackground(kind) };
}

export function withRampShape(document: ScenarioDocument, ramp: "separation" | "recombination", shape: RampShape): ScenarioDocument {
  if (document.protocol.kind !== "segments") return document;
  return { ...document, protocol: { ...document.protocol, [ramp]: { ...document.protocol[ramp], shape } } };
}

/**
 * The same lab described another way (areal radius ↔ proper distance from the horizon), so switching the
 * description does not move it.
 */
export function withLabPlacement(document: ScenarioDocument, placement: LabPlacement["placement"]): ScenarioDocument {
  if (document.lab.placement === placement) return document;
  const background = makeBackground(document.background, document.lab);
  switch (placement) {
    case "inertial":
    case "uniformly-accelerated":
      return { ...document, lab: { placement } };
    case "areal-radius": {
      return { ...document, lab: { placement, arealRadiusMetres: background.labRadiusMetres } };
    }
    case "proper-distance-from-horizon":
      return { ...document, lab: { placement, properDistanceMetres: background.labProperDistanceToHorizonMetres ?? 1 } };
  }
}

/** A recombination time traded against the hold (the total duration kept), as the optimiser proposes it. */
export function withRecombinationAndHold(document: ScenarioDocument, recombinationSeconds: number, holdSeconds: number): ScenarioDocument {
  if (document.protocol.kind !== "segments") return document;
  return withSegmentDuration(withSegmentDuration(document, "recombination", recombinationSeconds), "hold", holdSeconds);
}

/**
 * The document with this sampled profile as its protocol, and its separation distance set to the profile's
 * largest separation (the sampled history measures itself in that unit), so the two never disagree.
 */
export function withSampledProtocol(document: ScenarioDocument, protocol: SampledProtocol): ScenarioDocument {
  const peak = protocol.samples.reduce((m, s) => Math.max(m, Math.abs(s.separationMetres)), 0);
  return {
    ...document,
    protocol,
    separation: { ...document.separation, distanceMetres: peak > 0 ? peak : document.separation.distanceMetres },
  };
}
