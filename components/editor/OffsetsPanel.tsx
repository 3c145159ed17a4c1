"use client";

import dynamic from "next/dynamic";
import { memo, useDeferredValue, useEffect } from "react";
import { useEditor, useEditorStore } from "@/canvas/EditorProvider";
import { withProtocolPlan } from "@/canvas/kernels/document-edits";
import { HANDLE_IDS, HANDLE_WORDS, handleValueSI, isTimeHandle, type HandleId } from "@/canvas/kernels/offsets/handles";
import type { ScenarioDocument } from "@/physics/scenario/schema";
import { planHandleValue } from "@/canvas/kernels/offsets/typed-plan";
import { formatQuantity } from "@/physics/units";
import { BranchLegend } from "./BranchLegend";
import { QuantityField } from "./QuantityField";
import { useEdit } from "./useEdit";
import { useElementSize } from "./useElementSize";
import { usePanelValue } from "./usePacedDuringDrag";

const OffsetsStage = dynamic(() => import("@/canvas/layers/OffsetsStage"), {
  ssr: false,
  loading: () => <p className="p-4 text-sm text-ink-faint">Drawing the Offsets…</p>,
});

const HEIGHT = 300;

/** Every handle can be typed into: instants on the lab's clock from the start of the separation, and the separation. */
function HandleFields() {
  const document = usePanelValue((s) => s.document);
  const readOnly = useEditor((s) => s.readOnly);
  const selection = useDeferredValue(useEditor((s) => s.selection));
  return <HandleFieldsView document={document} readOnly={readOnly} selection={selection} />;
}

const HandleFieldsView = memo(function HandleFieldsView({ document, readOnly, selection }: { document: ScenarioDocument; readOnly: boolean; selection: HandleId | null }) {
  const store = useEditorStore();
  const edit = useEdit();
  if (document.protocol.kind !== "segments") return null;
  const protocol = document.protocol;
  return (
    <div className="mt-3 grid grid-cols-2 gap-2 sm:grid-cols-3 lg:grid-cols-5" role="group" aria-label="Handle values">
      {HANDLE_IDS.map((handle) => (
        <div key={handle} className={`rounded p-1 ${selection === handle ? "bg-branchB-tint/60" : ""}`}>
          <QuantityField
            compact
            label={HANDLE_WORDS[handle]}
            dimension={isTimeHandle(handle) ? "time" : "length"}
            shown={formatQuantity(handleValueSI(handle, protocol, document.separation), isTimeHandle(handle) ? "time" : "length", { digits: 4 })}
            disabled={readOnly}
            testId={`handle-field-${handle}`}
            onFocus={() => store.getState().select(handle)}
            onCommit={(valueSI) => {
              // Plan against the store's document, not the deferred one shown.
              const current = store.getState().document;
              if (current.protocol.kind !== "segments") return { ok: false, message: "the protocol is no longer made of segments" };
              const typed = planHandleValue(handle, valueSI, current.protocol, current.separation);
              if (!typed.ok) return { ok: false, message: typed.message };
              return edit(`Set ${HANDLE_WORDS[handle].toLowerCase()}`, (d) => withProtocolPlan(d, typed.plan));
            }}
          />
        </div>
      ))}
    </div>
  );
});

export function OffsetsPanel() {
  const store = useEditorStore();
  const readOnly = useEditor((s) => s.readOnly);
  const editable = useEditor((s) => !s.readOnly && s.document.protocol.kind === "segments");
  const [ref, size] = useElementSize<HTMLDivElement>({ width: 600, height: HEIGHT });
  useEffect(() => {
    if (size.width > 0) store.getState().setOffsetsSize({ width: size.width, height: HEIGHT });
  }, [store, size.width]);
  return (
    <section aria-labelledby="offsets-heading" className="min-w-0">
      <div className="mb-2 flex items-baseline justify-between gap-4">
        <h2 id="offsets-heading" className="text-sm font-semibold uppercase tracking-wide text-ink-soft">
          Offsets
        </h2>
        <p className="text-xs text-ink-faint">
          {editable
            ? "Drag a handle; Shift snaps to round values; Tab walks the handles, arrow keys nudge the selected one."
            : readOnly
              ? "Read-only."
              : "A formula or sampled profile has no handles: a formula is edited in the Protocol panel."}
        </p>
      </div>
      <div ref={ref} className="overflow-hidden rounded border border-rule" style={{ height: HEIGHT }}>
        {size.width > 0 && <OffsetsStage width={size.width} height={HEIGHT} />}
      </div>
      <div className="mt-2">
        <BranchLegend />
      </div>
      <HandleFields />
    </section>
  );
}
