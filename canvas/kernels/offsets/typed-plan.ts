/**
 * A handle's value typed in: the instant on the lab's clock (seconds from the start of the separation) or the full
 * separation. The same trades as a drag, but a value that breaks a constraint is refused with the reason instead of
 * being clamped.
 */
import type { SeparationSpec } from "@/physics/scenario/schema";
import { formatQuantity } from "@/physics/units";
import { segmentTimes, type SegmentsProtocol } from "../timeline";
import { unchangedPlan, type ProtocolPlan } from "./drag-plan";
import type { HandleId } from "./handles";

export type TypedPlan = { ok: true; plan: ProtocolPlan } | { ok: false; message: string };

const time = (s: number) => formatQuantity(s, "time");

export function planHandleValue(handle: HandleId, valueSI: number, protocol: SegmentsProtocol, separation: SeparationSpec): TypedPlan {
  const times = segmentTimes(protocol);
  const base = unchangedPlan(protocol, separation);
  switch (handle) {
    case "separation-start":
      if (!(valueSI < times.separationEnd)) return { ok: false, message: `the separation must start before it ends (${time(times.separationEnd)})` };
      return { ok: true, plan: { ...base, separationSeconds: times.separationEnd - valueSI } };
    case "separation-end":
      if (!(valueSI > times.separationStart)) return { ok: false, message: "the separation must end after it starts (0 s)" };
      if (valueSI > times.holdEnd) return { ok: false, message: `the separation must end no later than the end of the hold (${time(times.holdEnd)})` };
      return { ok: true, plan: { ...base, separationSeconds: valueSI, holdSeconds: times.holdEnd - valueSI } };
    case "hold-end":
      if (valueSI < times.separationEnd) {
        return { ok: false, message: `the recombination cannot start before the separation ends (${time(times.separationEnd)})` };
      }
      if (!(valueSI < times.recombinationEnd)) {
        return { ok: false, message: `the hold must end before the recombination does (${time(times.recombinationEnd)})` };
      }
      return { ok: true, plan: { ...base, holdSeconds: valueSI - times.separationEnd, recombinationSeconds: times.recombinationEnd - valueSI } };
    case "recombination-end":
      if (!(valueSI > times.holdEnd)) return { ok: false, message: `the recombination must end after the hold does (${time(times.holdEnd)})` };
      return { ok: true, plan: { ...base, recombinationSeconds: valueSI - times.holdEnd } };
    case "separation-size":
      if (valueSI < 0) return { ok: false, message: "the separation must not be negative" };
      return { ok: true, plan: { ...base, distanceMetres: valueSI } };
  }
}
