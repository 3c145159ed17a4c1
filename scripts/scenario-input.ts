/**
 * What the command-line tools share about their input: read a scenario document from a file or standard input,
 * and refuse bad input the one way — the reasons on standard error, one "path: message" a line, and exit code 2.
 * Commands throw an InputRefusal and runCommand turns it into that answer, so a command's code can also be called
 * in-process (tests) and answer the same lines.
 */
import { readFileSync } from "node:fs";

export interface InputIssue {
  path: string;
  message: string;
}

export class InputRefusal extends Error {
  readonly lines: string[];

  constructor(lines: string[]) {
    super(lines.join("\n"));
    this.name = "InputRefusal";
    this.lines = lines;
  }
}

export function refuse(lines: string[]): never {
  throw new InputRefusal(lines);
}

/** Refuses with a heading and one indented "path: message" line per issue. */
export function refuseIssues(heading: string, issues: InputIssue[]): never {
  refuse([heading, ...issues.map((issue) => `  ${issue.path || "(document)"}: ${issue.message}`)]);
}

/** The text of FILE, or of standard input for "-". */
export function readInputText(argument: string): string {
  try {
    return readFileSync(argument === "-" ? 0 : argument, "utf8");
  } catch (error) {
    refuse([`cannot read ${argument === "-" ? "standard input" : argument}: ${(error as Error).message}`]);
  }
}

/** The JSON of FILE (or standard input), or a refusal. */
export function readInputJson(argument: string): unknown {
  const text = readInputText(argument);
  try {
    return JSON.parse(text);
  } catch (error) {
    refuse([`not valid JSON: ${(error as Error).message}`]);
  }
}

/** Runs a command: its output to standard output; a refusal to standard error with exit code 2. */
export async function runCommand(command: () => Promise<Uint8Array | string> | Uint8Array | string): Promise<void> {
  try {
    process.stdout.write(await command());
  } catch (error) {
    if (!(error instanceof InputRefusal)) throw error;
    process.stderr.write(error.lines.join("\n") + "\n");
    process.exitCode = 2;
  }
}
