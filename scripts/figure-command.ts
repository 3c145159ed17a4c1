/**
 * The figure command's work (scripts/figure.ts is its entry point): a scenario's Diagram or a sweep's chart as the
 * app exports it, as the bytes of the file.
 *   npm run --silent figure -- FILE.json [--what diagram|sweep] [--format svg|pdf|png] [--theme light|dark]
 *     [--width PX] [--ratio 1|2|4] [--caption|--no-caption] [--legend|--no-legend] [--ground solid|transparent]
 *     [--lettering embedded|outlines] [--vary recombination-time|hold-time|lab-distance|gas-pressure|surroundings-temperature|surface-distance] [--from Q] [--to Q]
 *     [--points N] > out.svg
 * The same code as the browser's Export menu (canvas/export/render-figure.ts), with resvg drawing the PNG. Bad input
 * is refused with "path: message" lines (an InputRefusal: exit code 2 from the command), as the compute command.
 */
import { parseArgs } from "node:util";
import { exportDiagramDrawing, type StandaloneOptions } from "../canvas/export/export-figure";
import { measureWith, renderFigureFile, type FigureFileRequest } from "../canvas/export/render-figure";
import { buildDiagramScene } from "../canvas/kernels/diagram/scene";
import { defaultSweepRange } from "../canvas/kernels/sweep-range";
import { diagramHeightFor } from "../components/export/figure-size";
import { DEFAULT_SWEEP_FIGURE_SIZE, SWEEP_PARAMETER_WORDS, sweepDrawing } from "../components/export/sweep-export";
import { BackgroundInputError } from "../physics/backgrounds";
import { ScenarioInputError } from "../physics/scenario/input-error";
import { parseScenarioDocument, type ScenarioDocument } from "../physics/scenario/schema";
import { MAX_SWEEP_POINTS, parameterDimension, sweepScenario, type SweepParameter } from "../physics/sweeps";
import { parseQuantity } from "../physics/units";
import { InputRefusal, readInputJson, refuse, refuseIssues, type InputIssue } from "./scenario-input";
import { nodeFigureToolkit } from "./figure-toolkit";
import type { FigureToolkit } from "../canvas/export/render-figure";

const USAGE = [
  "usage: npm run --silent figure -- FILE.json [--what diagram|sweep] [--format svg|pdf|png] [--theme light|dark] [--width PX]",
  "         [--ratio 1|2|4] [--caption|--no-caption] [--legend|--no-legend] [--ground solid|transparent] [--lettering embedded|outlines]",
  "         [--vary recombination-time|hold-time|lab-distance|gas-pressure|surroundings-temperature|surface-distance] [--from QUANTITY] [--to QUANTITY] [--points N]   (FILE - reads standard input)",
];

/** The Sweep panel's number of points. */
const SWEEP_POINTS = 41;
const DEFAULT_DIAGRAM_WIDTH = 640;

function readArguments(argv: string[]) {
  try {
    return parseArgs({
      args: argv,
      allowPositionals: true,
      allowNegative: true,
      options: {
        what: { type: "string", default: "diagram" },
        format: { type: "string", default: "svg" },
        theme: { type: "string" },
        width: { type: "string" },
        ratio: { type: "string", default: "1" },
        caption: { type: "boolean", default: true },
        legend: { type: "boolean", default: true },
        ground: { type: "string", default: "solid" },
        lettering: { type: "string", default: "embedded" },
        vary: { type: "string" },
        from: { type: "string" },
        to: { type: "string" },
        points: { type: "string", default: String(SWEEP_POINTS) },
      },
    });
  } catch (error) {
    refuse([(error as Error).message, ...USAGE]);
  }
}

let toolkitOnce: FigureToolkit | null = null;
/** The fonts are read once per process. */
function sharedToolkit(): FigureToolkit {
  toolkitOnce ??= nodeFigureToolkit();
  return toolkitOnce;
}

/** The file the command writes for these arguments (without the node and script names); throws an InputRefusal. */
export async function figureCommand(argv: string[], given?: FigureToolkit): Promise<Uint8Array> {
  const args = readArguments(argv);
  if (args.positionals.length !== 1) refuse(USAGE);
  const issues: InputIssue[] = [];
  function oneOf<T extends string>(name: string, value: string, allowed: readonly T[]): T {
    if ((allowed as readonly string[]).includes(value)) return value as T;
    issues.push({ path: `--${name}`, message: `must be ${allowed.join(", ")}; got "${value}"` });
    return allowed[0];
  }
  function positiveInteger(name: string, text: string | undefined, fallback: number, most: number): number {
    if (text === undefined) return fallback;
    const value = Number(text);
    if (Number.isInteger(value) && value >= 1 && value <= most) return value;
    issues.push({ path: `--${name}`, message: `must be a whole number from 1 to ${most}; got "${text}"` });
    return fallback;
  }

  const what = oneOf("what", args.values.what, ["diagram", "sweep"] as const);
  const format = oneOf("format", args.values.format, ["svg", "pdf", "png"] as const);
  const lettering = oneOf("lettering", args.values.lettering, ["embedded", "outlines"] as const);
  const ground = oneOf("ground", args.values.ground, ["solid", "transparent"] as const);
  const theme = args.values.theme === undefined ? null : oneOf("theme", args.values.theme, ["light", "dark"] as const);
  const ratio = Number(oneOf("ratio", args.values.ratio, ["1", "2", "4"] as const));
  const width = positiveInteger("width", args.values.width, what === "sweep" ? DEFAULT_SWEEP_FIGURE_SIZE.width : DEFAULT_DIAGRAM_WIDTH, 8000);
  const points = positiveInteger("points", args.values.points, SWEEP_POINTS, MAX_SWEEP_POINTS);
  if (what === "diagram") for (const name of ["vary", "from", "to"] as const) if (args.values[name] !== undefined) issues.push({ path: `--${name}`, message: "applies to --what sweep only" });
  if (issues.length > 0) refuseIssues("the options cannot be used:", issues);

  const parsed = parseScenarioDocument(readInputJson(args.positionals[0]));
  if (!parsed.ok) refuseIssues("the scenario cannot be drawn:", parsed.issues);
  const document = parsed.document;
  const options: StandaloneOptions = { theme: theme ?? document.display.theme, ground, legend: args.values.legend, caption: args.values.caption };
  const request: FigureFileRequest = format === "svg" ? { format, lettering } : format === "png" ? { format, pixelRatio: ratio } : { format };
  const toolkit = given ?? sharedToolkit();
  const measure = measureWith(toolkit);

  /** Errors that name a document path become "path: message" lines; anything else is a bug and is thrown. */
  function asIssue(error: unknown): InputIssue {
    if (error instanceof ScenarioInputError || error instanceof BackgroundInputError) return { path: error.path, message: error.message };
    throw error;
  }

  function diagram(doc: ScenarioDocument) {
    const scene = buildDiagramScene(doc);
    if (!scene.ok) refuseIssues("the scenario cannot be drawn:", [scene.issue]);
    return { drawing: exportDiagramDrawing(doc, scene.scene, { width, height: diagramHeightFor(scene.scene.bounds, width) }, options, measure), title: "Branchline diagram" };
  }

  function sweep(doc: ScenarioDocument) {
    const parameter = oneOf("vary", args.values.vary ?? (doc.protocol.kind === "segments" ? "recombination-time" : "lab-distance"), Object.keys(SWEEP_PARAMETER_WORDS) as SweepParameter[]);
    const range = defaultSweepRange(doc, parameter);
    const dimension = parameterDimension(parameter);
    const bound = (name: "from" | "to", fallback: number | undefined): number => {
      const text = args.values[name];
      if (text === undefined) {
        if (fallback === undefined) issues.push({ path: `--${name}`, message: "this scenario has no default range for the sweep: give --from and --to" });
        return fallback ?? NaN;
      }
      const value = parseQuantity(text, dimension);
      if (value.ok) return value.valueSI;
      issues.push({ path: `--${name}`, message: value.message });
      return NaN;
    };
    const fromValue = bound("from", range?.from);
    const toValue = bound("to", range?.to);
    if (issues.length === 0 && !(toValue > fromValue)) issues.push({ path: "--to", message: "must be above --from" });
    if (issues.length > 0) refuseIssues("the options cannot be used:", issues);
    let result;
    try {
      result = sweepScenario(doc, { parameter, fromValue, toValue, points });
    } catch (error) {
      refuseIssues("the sweep cannot be computed:", [asIssue(error)]);
    }
    const height = Math.round((width * DEFAULT_SWEEP_FIGURE_SIZE.height) / DEFAULT_SWEEP_FIGURE_SIZE.width);
    return { drawing: sweepDrawing(doc, result, { width, height }, options, measure), title: `Branchline sweep of the ${SWEEP_PARAMETER_WORDS[parameter]}` };
  }

  let made;
    try {
      made = what === "diagram" ? diagram(document) : sweep(document);
    } catch (error) {
      if (error instanceof InputRefusal) throw error;
      refuseIssues("the scenario cannot be drawn:", [asIssue(error)]);
    }
    return (await renderFigureFile(made.drawing, { title: made.title }, request, toolkit)).bytes;
}
