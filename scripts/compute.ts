/**
 * Command line: compute a scenario document and print the result JSON (also `branchline compute`, which takes
 * --format csv|table too).
 *   npm run --silent compute -- FILE.json      (or "-" to read standard input)
 * Bad input (unreadable file, invalid JSON, a document that does not validate or cannot be computed) prints the
 * reasons on standard error, one "path: message" a line, and exits with code 2.
 */
import { computeCommand } from "./cli/commands/compute";
import { runCommand } from "./scenario-input";

void runCommand(() => computeCommand(process.argv.slice(2)));
