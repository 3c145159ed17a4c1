/**
 * The Lab view's derived values (its viewport, its time origin, the handles), memoised per store on the references
 * they come from. The store's state holds one set; they read only a structural slice of it.
 */
import type { ScenarioDocument, SeparationSpec } from "@/physics/scenario/schema";
import { handlePlacements, type HandlePlacement } from "../kernels/lab-view/handles";
import { fitLabViewport, type LabViewport } from "../kernels/lab-view/viewport";
import { memoizeLast } from "../kernels/memoize";
import { profileHistory } from "../kernels/profile";
import { segmentTimes, segmentsProtocolOf, type SegmentsProtocol } from "../kernels/timeline";
import type { LabToolState } from "../tools/lab-tool";

/** What the selectors read of the editor's state (a structural slice, so the state may hold the selectors). */
export interface LabViewInput {
  document: ScenarioDocument;
  labTool: LabToolState;
  labViewSize: { width: number; height: number };
  readOnly: boolean;
}

export interface LabViewSelectors {
  viewport(state: LabViewInput): LabViewport | null;
  originSeconds(state: LabViewInput): number;
  handles(state: LabViewInput): HandlePlacement[];
}

/** Shared, so that asking twice answers the same array (a new one each time would re-render subscribers forever). */
const NO_HANDLES: HandlePlacement[] = [];

/** One set per store (memoised values must not be shared between editors). */
export function createLabViewSelectors(): LabViewSelectors {
  const fitted = memoizeLast((protocol: SegmentsProtocol, separation: SeparationSpec, width: number, height: number) =>
    fitLabViewport(segmentTimes(protocol), separation, { width, height }),
  );
  // A formula or sampled profile is shown (not edited) on a plain linear time axis over its whole duration.
  const profiled = memoizeLast((protocol: ScenarioDocument["protocol"], separation: SeparationSpec, width: number, height: number) => {
    const history = profileHistory({ protocol, separation });
    if (!history) return null;
    const total = history.totalDurationSeconds;
    const thirds = { separationStart: 0, separationEnd: total / 3, holdEnd: (2 * total) / 3, recombinationEnd: total };
    return fitLabViewport(thirds, { split: separation.split, distanceMetres: history.peakSeparationMetres }, { width, height });
  });
  const placed = memoizeLast((viewport: LabViewport, protocol: SegmentsProtocol, separation: SeparationSpec, origin: number, readOnly: boolean) =>
    readOnly ? [] : handlePlacements(viewport, protocol, separation, origin),
  );
  const selectors: LabViewSelectors = {
    viewport(state) {
      if (state.labTool.name === "dragging") return state.labTool.start.viewport;
      const protocol = segmentsProtocolOf(state.document);
      const { width, height } = state.labViewSize;
      return protocol ? fitted(protocol, state.document.separation, width, height) : profiled(state.document.protocol, state.document.separation, width, height);
    },
    originSeconds(state) {
      return state.labTool.name === "dragging" ? (state.labTool.plan?.originSeconds ?? 0) : 0;
    },
    handles(state) {
      const protocol = segmentsProtocolOf(state.document);
      const viewport = protocol ? selectors.viewport(state) : null;
      if (!viewport || !protocol) return NO_HANDLES;
      return placed(viewport, protocol, state.document.separation, selectors.originSeconds(state), state.readOnly);
    },
  };
  return selectors;
}
