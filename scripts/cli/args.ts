/** Reading a command's arguments (node:util parseArgs), refusing unknown options with the command's usage. */
import { parseArgs, type ParseArgsConfig } from "node:util";
import { refuse, type InputIssue } from "../scenario-input";
import { OUTPUT_FORMATS, type OutputFormat } from "./output";

export function readArgs<T extends NonNullable<ParseArgsConfig["options"]>>(argv: string[], options: T, usage: string[]) {
  try {
    return parseArgs({ args: argv, options, allowPositionals: true, strict: true });
  } catch (error) {
    refuse([(error as Error).message, ...usage]);
  }
}

export function outputFormat(value: string | undefined, issues: InputIssue[], fallback: OutputFormat = "json"): OutputFormat {
  if (value === undefined) return fallback;
  if ((OUTPUT_FORMATS as readonly string[]).includes(value)) return value as OutputFormat;
  issues.push({ path: "--format", message: `must be ${OUTPUT_FORMATS.join(", ")}; got "${value}"` });
  return fallback;
}
