/** What the Offsets panel's live line says about the selected handle: its name and the value it sets, with its unit. */
import type { SeparationSpec } from "@/physics/scenario/schema";
import { formatQuantity } from "@/physics/units";
import type { SegmentsProtocol } from "../timeline";
import { HANDLE_WORDS, handleValueSI, isTimeHandle, type HandleId } from "./handles";

export function selectionWords(handle: HandleId | null, protocol: SegmentsProtocol | null, separation: SeparationSpec): string {
  if (!handle || !protocol) return "";
  const value = formatQuantity(handleValueSI(handle, protocol, separation), isTimeHandle(handle) ? "time" : "length", { digits: 4 });
  return `${HANDLE_WORDS[handle]} selected: ${value}${isTimeHandle(handle) ? " from the start of the separation" : ""}.`;
}
