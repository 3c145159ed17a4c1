/**
 * A sweep as a CSV file, in the Budget CSV's manner (budget-csv.ts): the scenario's inputs and the sweep's own
 * (parameter, range, points, spacing) as "# key: value unit" comment lines, then one row per point with the
 * parameter's value and each number with its unit in the column's header. Shared by POST /api/sweeps and the
 * command line.
 */
import type { Quantity } from "@/physics/result-basics";
import type { ScenarioDocument } from "@/physics/scenario/schema";
import type { SweepPoint, SweepResult } from "@/physics/sweeps";
import { budgetInputLines, csvText, csvValue } from "./budget-csv";

const COLUMNS: { header: string; of(p: SweepPoint): Quantity }[] = [
  { header: "total quanta <N> (both channels) [1]", of: (p) => p.totalQuanta },
  { header: "decoherence D (both channels) [1]", of: (p) => p.decoherence },
  { header: "electromagnetic quanta [1]", of: (p) => p.electromagneticQuanta },
  { header: "gravitational quanta [1]", of: (p) => p.gravitationalQuanta },
];

export function sweepCsvRows(sweep: SweepResult): string[][] {
  return [[`${sweep.parameter} [${sweep.unit}]`, ...COLUMNS.map((c) => c.header)], ...sweep.points.map((p) => [String(p.x), ...COLUMNS.map((c) => csvValue(c.of(p)))])];
}

export function sweepCsv(sweep: SweepResult, document: ScenarioDocument): string {
  const first = sweep.points[0]?.x;
  const last = sweep.points.at(-1)?.x;
  const sweepLines = [
    `# sweep.parameter: ${sweep.parameter}`,
    `# sweep.fromValue: ${first} ${sweep.unit}`,
    `# sweep.toValue: ${last} ${sweep.unit}`,
    `# sweep.points: ${sweep.points.length}`,
    `# sweep.spacing: ${sweep.spacing}`,
  ];
  const inputs = [...budgetInputLines(document), ...sweepLines].map((line) => `${line}\r\n`).join("");
  return `${inputs}${csvText(sweepCsvRows(sweep))}`;
}
