/** The error makeBackground throws for a lab placement that cannot exist in the chosen background. */

export type BackgroundInputErrorCode =
  | "invalid-input"
  | "lab-inside-horizon"
  | "lab-beyond-cosmological-horizon"
  | "placement-does-not-fit-background";

/** Thrown by makeBackground; `path` and `message` are ready for the API error shape's `fields`. */
export class BackgroundInputError extends Error {
  /** Dotted path into the scenario document, e.g. "lab.arealRadiusMetres". */
  readonly path: string;
  readonly code: BackgroundInputErrorCode;

  constructor(code: BackgroundInputErrorCode, path: string, message: string) {
    super(message);
    this.name = "BackgroundInputError";
    this.code = code;
    this.path = path;
  }
}
