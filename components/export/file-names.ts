/** Names of the files Branchline writes: the scenario's title in lower case with dashes, what the file holds, its type. */
import { scenarioFileName } from "@/physics/scenario/exchange";

export type FigureFormat = { kind: "png"; pixelRatio: 1 | 2 | 4 } | { kind: "svg" };

/** "slow-recombination-diagram.svg", "slow-recombination-diagram-2x.png". */
export function diagramFileName(title: string, format: FigureFormat): string {
  return format.kind === "svg" ? scenarioFileName(`${title} diagram`, "svg") : scenarioFileName(`${title} diagram ${format.pixelRatio}x`, "png");
}

/** "slow-recombination-budget.csv". */
export function budgetFileName(title: string): string {
  return scenarioFileName(`${title} budget`, "csv");
}

/** "slow-recombination.json": the scenario file (physics/scenario/exchange.ts). */
export function scenarioFileNameFor(title: string): string {
  return scenarioFileName(title, "json");
}
