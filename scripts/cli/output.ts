/** What `branchline` commands print on standard output: JSON, CSV, or a table for people (columns aligned). */
import { budgetCsv, budgetCsvRows, budgetFlagRows, BUDGET_CSV_HEADER, FLAGS_CSV_HEADER } from "../../canvas/export/budget-csv";
import { mapCsv, type MapForCsv } from "../../canvas/export/map-csv";
import { sweepCsv, sweepCsvRows } from "../../canvas/export/sweep-csv";
import type { MapGrid } from "../../physics/maps";
import type { ScenarioResult } from "../../physics/result";
import type { ScenarioDocument } from "../../physics/scenario/schema";
import type { SweepResult } from "../../physics/sweeps";

export const OUTPUT_FORMATS = ["json", "csv", "table"] as const;
export type OutputFormat = (typeof OUTPUT_FORMATS)[number];

/** Rows as text columns, each as wide as its widest cell, two spaces apart; numbers are right-aligned. */
export function table(rows: readonly (readonly string[])[]): string {
  const widths = rows.reduce<number[]>((w, row) => row.map((cell, i) => Math.max(w[i] ?? 0, cell.length)), []);
  const numeric = /^[-+]?(\d|\.\d)[\d.]*(e[-+]?\d+)?$/i;
  return rows.map((row) => row.map((cell, i) => (numeric.test(cell) ? cell.padStart(widths[i]) : cell.padEnd(widths[i]))).join("  ").trimEnd()).join("\n") + "\n";
}

export const json = (value: unknown) => `${JSON.stringify(value, null, 2)}\n`;

export function budgetOutput(result: ScenarioResult, document: ScenarioDocument, format: OutputFormat): string {
  if (format === "json") return json(result);
  if (format === "csv") return budgetCsv(result, document);
  return `${table([[...BUDGET_CSV_HEADER], ...budgetCsvRows(result)])}\n${table([[...FLAGS_CSV_HEADER], ...budgetFlagRows(result)])}`;
}

export function sweepOutput(sweep: SweepResult, document: ScenarioDocument, format: OutputFormat): string {
  if (format === "json") return json({ sweep });
  if (format === "csv") return sweepCsv(sweep, document);
  return table(sweepCsvRows(sweep));
}

/** The smallest and the largest computed point of a map's grid, where they are. */
function extremes(grid: MapGrid) {
  type Point = { log10: number; x: number; y: number };
  let low: Point | null = null;
  let high: Point | null = null;
  for (const [j, row] of grid.log10.entries()) {
    for (const [i, log10] of row.entries()) {
      if (log10 === null) continue;
      if (!low || log10 < low.log10) low = { log10, x: grid.x.values[i], y: grid.y.values[j] };
      if (!high || log10 > high.log10) high = { log10, x: grid.x.values[i], y: grid.y.values[j] };
    }
  }
  return { low, high };
}

/** A grid value for people: six significant digits, without the float's trailing noise. */
const readable = (value: number) => String(Number(value.toPrecision(6)));

const tenTo = (log10: number) => `${(10 ** (log10 - Math.floor(log10))).toPrecision(3)}e${Math.floor(log10)}`;

/** A finished map as JSON (its grid), CSV (one line per point, inputs first) or a summary table for people. */
export function mapOutput(map: MapForCsv & { result: MapGrid }, format: OutputFormat): string {
  const grid = map.result;
  if (format === "json") return json({ map: grid });
  if (format === "csv") return mapCsv(map);
  const unit = grid.unit === "1" ? "" : ` ${grid.unit}`;
  const axis = (a: MapGrid["x"]) => [a.parameter, `${readable(a.values[0])} … ${readable(a.values[a.values.length - 1])} ${a.unit}`, `${a.values.length} points, ${a.scale}`];
  const { low, high } = extremes(grid);
  const at = (p: { x: number; y: number }) => `at ${grid.x.parameter} = ${readable(p.x)} ${grid.x.unit}, ${grid.y.parameter} = ${readable(p.y)} ${grid.y.unit}`;
  const zeros = grid.log10.flat().filter((v) => v === null).length - grid.gaps.length;
  return table([
    ["quantity", grid.quantity, grid.unit === "1" ? "(a number)" : `(${grid.unit})`],
    ["x", ...axis(grid.x)],
    ["y", ...axis(grid.y)],
    ["smallest", low ? `${tenTo(low.log10)}${unit}` : "none computed", low ? at(low) : ""],
    ["largest", high ? `${tenTo(high.log10)}${unit}` : "none computed", high ? at(high) : ""],
    ["exact zeros", String(zeros), ""],
    ["not computed", String(grid.gaps.length), grid.gaps[0] ? `first: ${grid.gaps[0].path}: ${grid.gaps[0].message}` : ""],
  ]);
}
