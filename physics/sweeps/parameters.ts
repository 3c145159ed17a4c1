/**
 * Every parameter a sweep can vary, as a list, for the edges that read one from text (the API's request schema,
 * the command line). Written as a record over SweepParameter so that the type check fails when a parameter is
 * added to vary.ts and not here.
 */
import type { SweepParameter } from "./vary";

const listed: Record<SweepParameter, true> = {
  "recombination-time": true,
  "hold-time": true,
  "lab-distance": true,
  "gas-pressure": true,
  "surroundings-temperature": true,
  "surface-distance": true,
};

export const SWEEP_PARAMETERS = Object.keys(listed) as [SweepParameter, ...SweepParameter[]];
