/** `branchline compute FILE|-`: a scenario document's result (also `npm run compute`), computed here without limits. */
import { computeParsedScenario } from "../../../physics/compute";
import { parseScenarioDocument } from "../../../physics/scenario/schema";
import { readInputJson, refuse, refuseIssues, type InputIssue } from "../../scenario-input";
import { outputFormat, readArgs } from "../args";
import { budgetOutput } from "../output";

export const computeUsage = [
  "usage: branchline compute FILE.json [--format json|csv|table]   (FILE - reads standard input)",
  "  Computes the scenario document on this machine (no server, no cost ceiling) and prints the result:",
  "  json (the result document, as POST /api/compute answers), csv (the Budget CSV with the inputs in its header),",
  "  or table (the Budget's numbers with units and sources, then the validity flags).",
];

export function computeCommand(argv: string[]): string {
  const args = readArgs(argv, { format: { type: "string" } }, computeUsage);
  if (args.positionals.length !== 1) refuse(computeUsage);
  const issues: InputIssue[] = [];
  const format = outputFormat(args.values.format, issues);
  if (issues.length > 0) refuseIssues("the options cannot be used:", issues);
  const parsed = parseScenarioDocument(readInputJson(args.positionals[0]));
  if (!parsed.ok) refuseIssues("the scenario cannot be computed:", parsed.issues);
  const outcome = computeParsedScenario(parsed.document);
  if (!outcome.ok) refuseIssues("the scenario cannot be computed:", outcome.issues);
  return budgetOutput(outcome.result, parsed.document, format);
}
