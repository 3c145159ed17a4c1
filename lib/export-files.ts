/**
 * The files a scenario can be exported as by the API (and the names and media types they go out with): the
 * scenario file (physics/scenario/exchange.ts) and the Budget as CSV (budget-csv.ts). Pure, no React: shared by
 * the route handlers; the Export menu writes the same files in the browser.
 */
import type { z } from "zod";
import { exportQuerySchema } from "@/contracts/requests";
import type { ScenarioResult } from "@/physics/result";
import { SCENARIO_FILE_MEDIA_TYPE, scenarioFileText, toScenarioFile } from "@/physics/scenario/exchange";
import type { ScenarioDocument } from "@/physics/scenario/schema";
import { budgetCsv } from "@/canvas/export/budget-csv";
import { budgetFileName, scenarioFileNameFor } from "@/canvas/export/file-names";

export { exportQuerySchema };

export type ExportKind = z.infer<typeof exportQuerySchema>["what"];

export interface ExportFile {
  fileName: string;
  mediaType: string;
  text: string;
}

export function scenarioExport(scenario: { title: string; document: ScenarioDocument }, now = new Date()): ExportFile {
  return { fileName: scenarioFileNameFor(scenario.title), mediaType: SCENARIO_FILE_MEDIA_TYPE, text: scenarioFileText(toScenarioFile(scenario, now)) };
}

export function budgetExport(title: string, result: ScenarioResult, document: ScenarioDocument): ExportFile {
  return { fileName: budgetFileName(title), mediaType: "text/csv", text: budgetCsv(result, document) };
}

/** The file as a download (the name is ASCII letters, digits and dashes: safe in the header as it is). */
export function fileResponse(file: ExportFile): Response {
  return new Response(file.text, {
    status: 200,
    headers: {
      "content-type": `${file.mediaType}; charset=utf-8`,
      "content-disposition": `attachment; filename="${file.fileName}"`,
      "cache-control": "no-store",
    },
  });
}
