"use client";

/**
 * The Map: one quantity over two parameters of the saved scenario, computed by the queue's workers (POST /api/maps).
 * Choose the two parameters, their ranges and points, start; a progress bar (rows done of rows) with Cancel follows
 * the map; once done, a heat map with decade contours, the scenario's point and the optimum path (drawn from
 * canvas/export/map-figure.ts as an SVG image). Clicking the map sets the scenario to that point (one undo step).
 * The maps kept with the scenario are listed; each opens here. Export: SVG, PNG, PDF and CSV, inputs in the
 * caption and the header.
 */
import { memo, useMemo, useState, type MouseEvent } from "react";
import { useEditor } from "@/canvas/EditorProvider";
import { DEFAULT_STANDALONE, exportPalette } from "@/canvas/export/export-figure";
import { diagramSvg } from "@/canvas/export/diagram-svg";
import { mapFigureDrawing, mapPointAt } from "@/canvas/export/map-figure";
import { measureWith, renderFigureFile, type FigureFileRequest } from "@/canvas/export/render-figure";
import { defaultSweepRange, mapParametersFor } from "@/canvas/kernels/sweep-range";
import { messageOf } from "@/components/api/client";
import { useCancelMap, useParameterMap, useScenarioMaps, useStartMap, type ParameterMapDto } from "@/components/api/maps";
import { browserFigureToolkit } from "@/components/export/browser-figure-toolkit";
import { downloadBytes, downloadText } from "@/components/export/download";
import { mapFileName } from "@/canvas/export/file-names";
import { mapCsv } from "@/canvas/export/map-csv";
import { DEFAULT_MAP_FIGURE_SIZE, MAP_QUANTITY_WORDS, mapDrawing, mapFigureData } from "@/components/export/map-export";
import { buttonStyles } from "@/components/ui/styles";
import { MAP_QUANTITIES, MAX_MAP_SIDE, type AxisScale, type MapQuantity } from "@/physics/maps/axes";
import { documentAt } from "@/physics/maps/point";
import type { ScenarioDocument } from "@/physics/scenario/schema";
import type { SweepParameter } from "@/physics/sweeps/vary";
import { FlagIcon } from "./FlagIcon";
import { CompactSelect } from "@/components/ui/Field";
import { RangeFields } from "./RangeFields";
import { dimensionOf, PARAMETER_WORDS } from "./SweepChart";
import { useEdit } from "./useEdit";
import { usePanelValue } from "./usePacedDuringDrag";

interface AxisDraft {
  parameter: SweepParameter;
  from: number;
  to: number;
  points: number;
  scale: AxisScale;
}

const DEFAULT_POINTS = 24;

function draftFor(document: ScenarioDocument, parameter: SweepParameter): AxisDraft {
  const range = defaultSweepRange(document, parameter) ?? { from: 1e-3, to: 1 };
  return { parameter, from: range.from, to: range.to, points: DEFAULT_POINTS, scale: "log" };
}

export function MapPanel({ projectId, scenarioId, title }: { projectId: string; scenarioId: string; title: string }) {
  const document = usePanelValue((s) => s.document);
  return <MapView projectId={projectId} scenarioId={scenarioId} title={title} document={document} />;
}

const MapView = memo(function MapView({ projectId, scenarioId, title, document }: { projectId: string; scenarioId: string; title: string; document: ScenarioDocument }) {
  const readOnly = useEditor((s) => s.readOnly);
  const available = mapParametersFor(document);
  const [x, setX] = useState<AxisDraft | null>(null);
  const [y, setY] = useState<AxisDraft | null>(null);
  const [quantity, setQuantity] = useState<MapQuantity>("total-quanta");
  const [openId, setOpenId] = useState<string | null>(null);
  const start = useStartMap(projectId, scenarioId);
  const cancel = useCancelMap(projectId, scenarioId);
  const list = useScenarioMaps(projectId, scenarioId);
  const map = useParameterMap(openId);

  if (available.length < 2) {
    return (
      <section aria-labelledby="map-heading" data-testid="map">
        <h2 id="map-heading" className="mb-2 text-sm font-semibold uppercase tracking-wide text-ink-soft">
          Map
        </h2>
        <p className="text-sm text-ink-soft">A map needs two parameters to vary: this scenario has fewer (a formula or sampled profile has no segment times; a flat lab has no distance).</p>
      </section>
    );
  }
  const xAxis = x && available.includes(x.parameter) ? x : draftFor(document, available[0]);
  const yAxis = y && available.includes(y.parameter) && y.parameter !== xAxis.parameter ? y : draftFor(document, available.find((p) => p !== xAxis.parameter)!);

  const run = () =>
    start.mutate(
      { scenario: { projectId, scenarioId }, x: xAxis, y: yAxis, quantity },
      { onSuccess: (started) => setOpenId(started.id) },
    );
  const shown = map.data ?? null;
  const active = shown?.status === "queued" || shown?.status === "running";

  return (
    <section aria-labelledby="map-heading" data-testid="map">
      <h2 id="map-heading" className="mb-2 text-sm font-semibold uppercase tracking-wide text-ink-soft">
        Map
      </h2>
      {!readOnly && (
        <div className="space-y-2">
          <div className="flex flex-wrap items-end gap-3">
            <AxisFields name="x" axis={xAxis} available={available.filter((p) => p !== yAxis.parameter)} document={document} onChange={setX} />
          </div>
          <div className="flex flex-wrap items-end gap-3">
            <AxisFields name="y" axis={yAxis} available={available.filter((p) => p !== xAxis.parameter)} document={document} onChange={setY} />
          </div>
          <div className="flex flex-wrap items-end gap-3">
            <CompactSelect<MapQuantity> label="Quantity" value={quantity} options={MAP_QUANTITIES.map((q) => ({ value: q, words: MAP_QUANTITY_WORDS[q] }))} onChange={setQuantity} />
            <button type="button" className={`${buttonStyles.secondary} py-1.5`} onClick={run} disabled={start.isPending || active} data-testid="start-map">
              {start.isPending ? "Starting…" : "Start map"}
            </button>
            <span className="text-xs text-ink-soft">
              {xAxis.points * yAxis.points} points of the saved scenario, computed by the map workers
            </span>
          </div>
          {start.isError && (
            <p role="alert" className="flex items-start gap-2 text-sm text-invalid">
              <FlagIcon kind="invalid" /> The map could not start: {messageOf(start.error)}
            </p>
          )}
        </div>
      )}
      {shown && active && (
        <div className="mt-3 flex items-center gap-3 text-xs text-ink-soft" data-testid="map-progress">
          <progress className="h-2 w-64" max={shown.progress.rowsTotal} value={shown.progress.rowsDone} aria-label="Map progress" />
          {shown.progress.rowsDone} of {shown.progress.rowsTotal} rows ({shown.status})
          {!readOnly && (
            <button type="button" className={buttonStyles.row} onClick={() => cancel.mutate(shown.id)} disabled={cancel.isPending}>
              Cancel
            </button>
          )}
        </div>
      )}
      {shown && (shown.status === "failed" || shown.status === "cancelled") && (
        <p className="mt-3 flex items-start gap-2 text-sm text-caution">
          <FlagIcon kind="caution" /> This map was {shown.status}
          {shown.failure ? `: ${shown.failure}` : ""}.
        </p>
      )}
      {shown?.status === "done" && shown.result && <MapResult map={shown} document={document} title={title} readOnly={readOnly} />}
      {(list.data?.length ?? 0) > 0 && (
        <details className="mt-3 text-sm">
          <summary className="cursor-pointer text-ink-soft">Maps kept with this scenario ({list.data!.length})</summary>
          <ul className="mt-1 space-y-1" aria-label="Maps kept with this scenario">
            {list.data!.map((m) => (
              <li key={m.id}>
                <button type="button" className={buttonStyles.row} onClick={() => setOpenId(m.id)}>
                  {MAP_QUANTITY_WORDS[m.request.quantity]} over {PARAMETER_WORDS[m.request.x.parameter]} × {PARAMETER_WORDS[m.request.y.parameter]}, {m.request.x.points} × {m.request.y.points},{" "}
                  {m.status === "done" ? "done" : `${m.status} (${m.progress.rowsDone} of ${m.progress.rowsTotal} rows)`}, v{m.scenario?.version}, {new Date(m.createdAt).toLocaleString()}
                </button>
              </li>
            ))}
          </ul>
        </details>
      )}
    </section>
  );
});

function AxisFields({ name, axis, available, document, onChange }: { name: "x" | "y"; axis: AxisDraft; available: SweepParameter[]; document: ScenarioDocument; onChange(axis: AxisDraft): void }) {
  const dimension = dimensionOf(axis.parameter);
  return (
    <>
      <CompactSelect
        label={name === "x" ? "Across (x)" : "Up (y)"}
        value={axis.parameter}
        options={available.map((p) => ({ value: p, words: PARAMETER_WORDS[p] }))}
        onChange={(parameter) => onChange(draftFor(document, parameter))}
        ariaLabel={`Map ${name} parameter`}
      />
      <RangeFields range={axis} dimension={dimension} labels={[`${name} from`, `${name} to`]} onChange={(range) => onChange({ ...axis, ...range })} />
      <label className="block text-xs font-semibold text-ink-soft">
        Points
        <input
          type="number"
          min={2}
          max={MAX_MAP_SIDE}
          className="mt-1 block w-20 rounded border border-rule-strong bg-white px-2 py-1.5 text-sm font-normal text-ink"
          value={axis.points}
          onChange={(e) => {
            const points = Math.round(Number(e.target.value));
            if (points >= 2 && points <= MAX_MAP_SIDE) onChange({ ...axis, points });
          }}
          aria-label={`Map ${name} points (2 to ${MAX_MAP_SIDE})`}
        />
      </label>
      <CompactSelect
        label="Spacing"
        value={axis.scale}
        options={[{ value: "log", words: "log" }, { value: "linear", words: "linear" }] as const}
        onChange={(scale) => onChange({ ...axis, scale })}
        ariaLabel={`Map ${name} spacing`}
      />
    </>
  );
}

const FILE_KINDS = ["svg", "png", "pdf"] as const;

function MapResult({ map, document, title, readOnly }: { map: ParameterMapDto; document: ScenarioDocument; title: string; readOnly: boolean }) {
  const edit = useEdit();
  const [problem, setProblem] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const result = map.result!;
  const size = DEFAULT_MAP_FIGURE_SIZE;
  const theme = document.display.theme;
  const svgUrl = useMemo(() => {
    const drawing = mapFigureDrawing(mapFigureData(document, { request: map.request, result }), size, exportPalette(theme), true);
    return `data:image/svg+xml;charset=utf-8,${encodeURIComponent(diagramSvg(drawing, { title: `${title}: map` }))}`;
  }, [document, map.request, result, size, theme]);

  const pick = (event: MouseEvent<HTMLImageElement>) => {
    if (readOnly) return;
    const box = event.currentTarget.getBoundingClientRect();
    const at = mapPointAt(result, size, { x: ((event.clientX - box.left) * size.width) / box.width, y: ((event.clientY - box.top) * size.height) / box.height });
    if (!at) return;
    const outcome = edit(`Set ${PARAMETER_WORDS[map.request.x.parameter]} and ${PARAMETER_WORDS[map.request.y.parameter]} from the map`, (d) => documentAt(d, map.request, at.x, at.y));
    setProblem(outcome.ok ? null : `That point cannot be used: ${outcome.message}`);
  };

  const save = async (kind: (typeof FILE_KINDS)[number]) => {
    setBusy(true);
    setProblem(null);
    try {
      const toolkit = await browserFigureToolkit();
      const drawing = mapDrawing(document, { request: map.request, result, document: map.document }, size, { theme, ...DEFAULT_STANDALONE }, measureWith(toolkit));
      const request: FigureFileRequest = kind === "svg" ? { format: "svg", lettering: "embedded" } : kind === "png" ? { format: "png", pixelRatio: 2 } : { format: "pdf" };
      const file = await renderFigureFile(drawing, { title: `${title}: map` }, request, toolkit);
      downloadBytes(mapFileName(title, kind === "png" ? { kind, pixelRatio: 2 } : { kind }), file.bytes, file.mediaType);
    } catch (error) {
      setProblem(`The ${kind.toUpperCase()} could not be written: ${error instanceof Error ? error.message : String(error)}`);
    } finally {
      setBusy(false);
    }
  };
  const saveCsv = () => downloadText(mapFileName(title, { kind: "csv" }), mapCsv(map), "text/csv");

  return (
    <div className="mt-3 space-y-2">
      <img
        src={svgUrl}
        width={size.width}
        height={size.height}
        className={`h-auto w-full max-w-[640px] ${readOnly ? "" : "cursor-crosshair"}`}
        alt={`Map of ${MAP_QUANTITY_WORDS[map.request.quantity]} over ${PARAMETER_WORDS[map.request.x.parameter]} and ${PARAMETER_WORDS[map.request.y.parameter]}`}
        onClick={pick}
        data-testid="map-figure"
      />
      <p className="text-xs text-ink-soft">
        Colour: log₁₀ of the quantity; lines at whole decades; dashed: the optimum; the dot: the scenario now. Computed for version {map.scenario?.version} of the scenario;{" "}
        {result.gaps.length > 0 && `${result.gaps.length} points could not be computed (pale cells; the CSV says why); `}
        {!readOnly && "click the map to set the scenario to that point."}
      </p>
      <div className="flex flex-wrap gap-2">
        {FILE_KINDS.map((kind) => (
          <button key={kind} type="button" className={buttonStyles.row} disabled={busy} onClick={() => save(kind)} aria-label={`Download map ${kind.toUpperCase()}`}>
            {kind.toUpperCase()}
          </button>
        ))}
        <button type="button" className={buttonStyles.row} onClick={saveCsv} aria-label="Download map CSV">
          CSV
        </button>
      </div>
      {problem && (
        <p role="alert" className="flex items-start gap-2 text-sm text-invalid">
          <FlagIcon kind="invalid" /> {problem}
        </p>
      )}
    </div>
  );
}
