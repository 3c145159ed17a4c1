/**
 * Command line: compute a scenario document and print the result JSON.
 *   npm run --silent compute -- FILE.json      (or "-" to read standard input)
 * Bad input (unreadable file, invalid JSON, a document that does not validate or cannot be computed) prints the
 * reasons on standard error, one "path: message" a line, and exits with code 2.
 */
import { computeScenarioFromJson } from "../physics/compute";
import { readInputJson, refuse, refuseIssues, runCommand } from "./scenario-input";

const USAGE = "usage: npm run --silent compute -- FILE.json   (or - for standard input)";

void runCommand(() => {
  const argument = process.argv[2];
  if (argument === undefined || process.argv.length > 3) refuse([USAGE]);
  const outcome = computeScenarioFromJson(readInputJson(argument));
  if (!outcome.ok) refuseIssues("the scenario cannot be computed:", outcome.issues);
  return JSON.stringify(outcome.result, null, 2) + "\n";
});
