/**
 * `branchline <command>`: the command line for scripts and notebooks (bin/branchline.mjs runs this through tsx).
 * One table of commands; each has --help. Data goes to standard output (JSON, CSV or a table), messages and
 * progress to standard error, and the exit code says how it ended (failure.ts, `branchline --help`).
 */
import { figureCommand } from "../figure-command";
import { InputRefusal } from "../scenario-input";
import { computeCommand, computeUsage } from "./commands/compute";
import { mapCommand, mapUsage } from "./commands/map";
import { pullCommand, pullUsage, pushCommand, pushUsage } from "./commands/project-sync";
import { sweepCommand, sweepUsage } from "./commands/sweep";
import { CommandFailure, EXIT, EXIT_CODE_HELP, type ExitCode } from "./failure";

interface Command {
  summary: string;
  usage: string[];
  /** Data to standard output as its answer; messages to `io.stderr`. */
  run(argv: string[], io: Io): Promise<string | Uint8Array> | string | Uint8Array;
}

const figureUsage = [
  "usage: branchline figure FILE.json [--what diagram|sweep] [--format svg|pdf|png] [--theme light|dark] [--width PX]",
  "         [--ratio 1|2|4] [--caption|--no-caption] [--legend|--no-legend] [--ground solid|transparent] [--lettering embedded|outlines]",
  "         [--vary PARAMETER] [--from QUANTITY] [--to QUANTITY] [--points N]   (FILE - reads standard input)",
  "  Draws the scenario's Diagram or a sweep's chart as the editor exports it and writes the file to standard output.",
];

/** Every command, each in its own module under commands/ (figure's in scripts/figure-command.ts, shared with npm run figure). */
export const commands: Record<string, Command> = {
  compute: { summary: "compute a scenario document here (JSON, CSV or a table)", usage: computeUsage, run: computeCommand },
  sweep: { summary: "sweep one parameter, here or on the server (--remote)", usage: sweepUsage, run: sweepCommand },
  map: { summary: "map one quantity over two parameters, here or by the server's workers (--remote)", usage: mapUsage, run: (argv, io) => mapCommand(argv, io.stderr) },
  figure: { summary: "draw the Diagram or a sweep's chart as SVG, PNG or PDF", usage: figureUsage, run: (argv) => figureCommand(argv) },
  pull: { summary: "write a project's scenarios into a folder, recording their versions", usage: pullUsage, run: pullCommand },
  push: { summary: "send changed scenario files back as new versions (stale ones refused)", usage: pushUsage, run: pushCommand },
};

function overview(): string {
  const width = Math.max(...Object.keys(commands).map((name) => name.length));
  return [
    "usage: branchline <command> [options]   (branchline <command> --help for one command)",
    "",
    "commands:",
    ...Object.entries(commands).map(([name, c]) => `  ${name.padEnd(width)}  ${c.summary}`),
    "",
    "environment:",
    "  BRANCHLINE_URL    the server for pull, push and --remote (default http://localhost:3000)",
    "  BRANCHLINE_TOKEN  a personal API token from your account page, sent as Authorization: Bearer",
    "",
    ...EXIT_CODE_HELP,
    "",
  ].join("\n");
}

export interface Io {
  stdout: { write(chunk: string | Uint8Array): unknown };
  stderr: { write(chunk: string): unknown };
}

/** Runs one command line (without the node and script names); answers the exit code. */
export async function main(argv: string[], io: Io = process): Promise<ExitCode> {
  const [name, ...rest] = argv;
  if (name === undefined || name === "--help" || name === "-h" || name === "help") {
    io.stdout.write(overview());
    return name === undefined ? EXIT.badInput : EXIT.ok;
  }
  const command = commands[name];
  if (!command) {
    io.stderr.write(`unknown command "${name}"\n\n${overview()}`);
    return EXIT.badInput;
  }
  if (rest.includes("--help") || rest.includes("-h")) {
    io.stdout.write(`${command.usage.join("\n")}\n\n${EXIT_CODE_HELP.join("\n")}\n`);
    return EXIT.ok;
  }
  try {
    io.stdout.write(await command.run(rest, io));
    return EXIT.ok;
  } catch (error) {
    if (error instanceof InputRefusal) {
      io.stderr.write(`${error.lines.join("\n")}\n`);
      return EXIT.badInput;
    }
    if (error instanceof CommandFailure) {
      if (error.output) io.stdout.write(error.output);
      io.stderr.write(`${error.lines.join("\n")}\n`);
      return error.exitCode;
    }
    io.stderr.write(`branchline ${name}: unexpected error (please report it)\n${(error as Error).stack ?? String(error)}\n`);
    return EXIT.unexpected;
  }
}
