/**
 * How a `branchline` command ends when it cannot do its job: lines for standard error and an exit code. The codes
 * (also in `branchline --help` and docs/api.md):
 */
export const EXIT = {
  /** Done. */
  ok: 0,
  /** Something unexpected (a bug): the error is printed. */
  unexpected: 1,
  /** Bad input: usage, an option, a document that does not validate or cannot be computed (also the server's 400/413/422). */
  badInput: 2,
  /** A push refused as stale: the scenario changed on the server since it was pulled; nothing was overwritten. */
  stale: 3,
  /** The server refused the caller: no or a bad token (401), not allowed (403), not found or not visible (404). */
  refused: 4,
  /** The server could not answer now: unreachable, busy (503), rate-limited (429) or failing (5xx), or a remote map failed or was cancelled there; try again later. */
  unavailable: 5,
} as const;

export type ExitCode = (typeof EXIT)[keyof typeof EXIT];

export const EXIT_CODE_HELP = [
  "exit codes:",
  "  0  done",
  "  1  something unexpected (a bug; the error is printed)",
  "  2  bad input: usage, an option, or a document that does not validate or cannot be computed",
  "  3  push refused as stale: a scenario changed on the server since it was pulled (nothing was overwritten)",
  "  4  the server refused: no or a bad BRANCHLINE_TOKEN (401), not allowed (403), not found (404)",
  "  5  the server could not answer now: unreachable, busy, rate-limited or failing, or a remote map failed or was",
  "     cancelled on the server; try again later",
];

export class CommandFailure extends Error {
  readonly lines: string[];

  constructor(
    readonly exitCode: ExitCode,
    lines: string[],
    /** What the command did before it failed, for standard output (a push's report). */
    readonly output: string = "",
  ) {
    super(lines.join("\n"));
    this.name = "CommandFailure";
    this.lines = lines;
  }
}
