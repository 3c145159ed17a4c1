/**
 * Command line: compute a scenario document and print the result JSON.
 *   npm run --silent compute -- FILE.json      (or "-" to read standard input)
 * Bad input (unreadable file, invalid JSON, a document that does not validate or cannot be computed) prints the
 * reasons on standard error, one "path: message" a line, and exits with code 2.
 */
import { readFileSync } from "node:fs";
import { computeScenarioFromJson } from "../physics/compute";

const USAGE = "usage: npm run --silent compute -- FILE.json   (or - for standard input)";

function fail(lines: string[]): never {
  process.stderr.write(lines.join("\n") + "\n");
  process.exit(2);
}

function readInput(argument: string | undefined): string {
  if (argument === undefined || process.argv.length > 3) fail([USAGE]);
  try {
    return readFileSync(argument === "-" ? 0 : argument, "utf8");
  } catch (error) {
    fail([`cannot read ${argument === "-" ? "standard input" : argument}: ${(error as Error).message}`]);
  }
}

const text = readInput(process.argv[2]);
let json: unknown;
try {
  json = JSON.parse(text);
} catch (error) {
  fail([`not valid JSON: ${(error as Error).message}`]);
}
const outcome = computeScenarioFromJson(json);
if (!outcome.ok) {
  fail(["the scenario cannot be computed:", ...outcome.issues.map((issue) => `  ${issue.path || "(document)"}: ${issue.message}`)]);
}
process.stdout.write(JSON.stringify(outcome.result, null, 2) + "\n");
