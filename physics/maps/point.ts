/**
 * The document at one point of a map: both parameters set (physics/sweeps/vary.ts says what each changes). Light
 * (no computation): the editor uses it to set the scenario to a point it was clicked at.
 */
import type { ScenarioDocument } from "../scenario/schema";
import { withParameter } from "../sweeps/vary";
import type { MapRequest } from "./axes";

export function documentAt(document: ScenarioDocument, request: Pick<MapRequest, "x" | "y">, x: number, y: number): ScenarioDocument {
  return withParameter(withParameter(document, request.y.parameter, y), request.x.parameter, x);
}
