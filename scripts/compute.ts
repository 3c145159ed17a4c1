/**
 * Command line: compute a scenario document and print the result JSON.
 *   npm run --silent compute -- FILE.json      (or "-" to read standard input)
 * Bad input (unreadable file, invalid JSON, a document that does not validate or cannot be computed) prints the
 * reasons on standard error, one "path: message" a line, and exits with code 2.
 */
import { computeScenarioFromJson } from "../physics/compute";
import { fail, failWithIssues, readInputJson } from "./scenario-input";

const USAGE = "usage: npm run --silent compute -- FILE.json   (or - for standard input)";

const argument = process.argv[2];
if (argument === undefined || process.argv.length > 3) fail([USAGE]);
const outcome = computeScenarioFromJson(readInputJson(argument));
if (!outcome.ok) failWithIssues("the scenario cannot be computed:", outcome.issues);
process.stdout.write(JSON.stringify(outcome.result, null, 2) + "\n");
