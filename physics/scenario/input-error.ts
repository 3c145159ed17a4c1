/** A document that parses but cannot be computed (a formula that does not evaluate, sample times out of order). */
export class ScenarioInputError extends Error {
  /** Dotted path into the scenario document, e.g. "protocol.expression". */
  readonly path: string;

  constructor(path: string, message: string) {
    super(message);
    this.name = "ScenarioInputError";
    this.path = path;
  }
}
