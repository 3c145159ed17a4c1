/** One entry of the table of sources (physics/estimators/sources.ts): a formula, where it is published, when it holds. */
export interface SourceEntry {
  title: string;
  citation: string;
  /** The formula as evaluated, in LaTeX (SI units). */
  formula: string;
  assumptions: string[];
  failureModes: string[];
}
