/** What `branchline` commands print on standard output: JSON, CSV, or a table for people (columns aligned). */
import { budgetCsv, budgetCsvRows, budgetFlagRows, BUDGET_CSV_HEADER, FLAGS_CSV_HEADER } from "../../canvas/export/budget-csv";
import { sweepCsv, sweepCsvRows } from "../../canvas/export/sweep-csv";
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
