/**
 * A parameter map as a CSV file (RFC 4180, as the Budget's: canvas/export/budget-csv.ts): the inputs first, one
 * "# key: value" comment line each — what was mapped, both axes, and the scenario document itself — then one row
 * per point: both parameters (SI, unit in the column name), the quantity, and its log10. A point that could not be
 * computed has empty value columns and its reason in the last column; an exact zero is "0" with an empty log10.
 * Shared by GET /api/maps/{id}?format=csv and the editor's Map export. Pure.
 */
import { figureCaption } from "./figure-caption";
import type { MapGrid, MapRequest } from "@/physics/maps/axes";
import type { ScenarioDocument } from "@/physics/scenario/schema";
import { budgetInputLines, csvText, csvValue } from "./budget-csv";

export interface MapForCsv {
  id?: string;
  document: ScenarioDocument;
  request: MapRequest;
  result: MapGrid | null;
}

const columnName = (parameter: string, unit: string) => `${parameter.replace(/-/g, "_")}_${unit === "1" ? "count" : unit}`;

/** The value of a log10 as the Budget's CSV writes a quantity (shortest double, or mantissa e exponent beyond it). */
function valueOf(log10: number | null): string {
  if (log10 === null) return "0";
  const value = 10 ** log10;
  return csvValue({ value: Number.isFinite(value) && value > 0 ? value : null, log10, unit: "1", sourceKey: "visibility" });
}

export function mapInputLines(map: MapForCsv): string[] {
  const axis = (name: "x" | "y") => {
    const a = map.request[name];
    return `# ${name}: ${a.parameter} from ${a.from} to ${a.to} (SI), ${a.points} points, ${a.scale} spacing`;
  };
  return [
    "# Branchline parameter map",
    ...(map.id ? [`# map: ${map.id}`] : []),
    `# quantity: ${map.request.quantity}${map.result ? ` (unit ${map.result.unit})` : ""}`,
    axis("x"),
    axis("y"),
    `# scenario: ${figureCaption(map.document).replace(/[\r\n]+/g, " ")}`,
    ...budgetInputLines(map.document).map((line) => line.replace(/^# /, "# document.")),
  ];
}

export function mapCsv(map: MapForCsv): string {
  const grid = map.result;
  if (!grid) throw new Error("mapCsv needs a finished map");
  const gaps = new Map(grid.gaps.map((g) => [`${g.column},${g.row}`, `${g.path}: ${g.message}`]));
  const header = [columnName(grid.x.parameter, grid.x.unit), columnName(grid.y.parameter, grid.y.unit), columnName(grid.quantity, grid.unit), `log10_${grid.quantity.replace(/-/g, "_")}`, "not_computed_because"];
  const rows: string[][] = [header];
  grid.y.values.forEach((y, row) => {
    grid.x.values.forEach((x, column) => {
      const gap = gaps.get(`${column},${row}`);
      const log10 = grid.log10[row][column];
      rows.push([String(x), String(y), gap ? "" : valueOf(log10), gap || log10 === null ? "" : String(log10), gap ?? ""]);
    });
  });
  return `${mapInputLines(map).map((line) => `${line}\r\n`).join("")}${csvText(rows)}`;
}
