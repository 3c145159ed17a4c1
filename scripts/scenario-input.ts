/**
 * What the command-line tools share about their input: read a scenario document from a file or standard input,
 * and refuse bad input the one way — the reasons on standard error, one "path: message" a line, and exit code 2.
 */
import { readFileSync } from "node:fs";

export interface InputIssue {
  path: string;
  message: string;
}

export function fail(lines: string[]): never {
  process.stderr.write(lines.join("\n") + "\n");
  process.exit(2);
}

/** Refuses with a heading and one indented "path: message" line per issue. */
export function failWithIssues(heading: string, issues: InputIssue[]): never {
  fail([heading, ...issues.map((issue) => `  ${issue.path || "(document)"}: ${issue.message}`)]);
}

/** The text of FILE, or of standard input for "-". */
export function readInputText(argument: string): string {
  try {
    return readFileSync(argument === "-" ? 0 : argument, "utf8");
  } catch (error) {
    fail([`cannot read ${argument === "-" ? "standard input" : argument}: ${(error as Error).message}`]);
  }
}

/** The JSON of FILE (or standard input), or a refusal. */
export function readInputJson(argument: string): unknown {
  const text = readInputText(argument);
  try {
    return JSON.parse(text);
  } catch (error) {
    fail([`not valid JSON: ${(error as Error).message}`]);
  }
}
