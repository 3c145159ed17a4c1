/** Names of the files Branchline writes: the scenario's title in lower case with dashes, what the file holds, its type. */
import { scenarioFileName } from "@/physics/scenario/exchange";

export type FigureFormat = { kind: "png"; pixelRatio: number } | { kind: "svg" } | { kind: "pdf" };

function figureFileName(title: string, what: string, format: FigureFormat): string {
  return format.kind === "png" ? scenarioFileName(`${title} ${what} ${format.pixelRatio}x`, "png") : scenarioFileName(`${title} ${what}`, format.kind);
}

/** "slow-recombination-diagram.svg", "slow-recombination-diagram-2x.png", "slow-recombination-diagram.pdf". */
export function diagramFileName(title: string, format: FigureFormat): string {
  return figureFileName(title, "diagram", format);
}

/** "slow-recombination-sweep.svg", "slow-recombination-sweep-2x.png", "slow-recombination-sweep.pdf". */
export function sweepFileName(title: string, format: FigureFormat): string {
  return figureFileName(title, "sweep", format);
}

/** "slow-recombination-budget.png", "slow-recombination-budget.svg": the Budget table as a picture. */
export function budgetPictureFileName(title: string, kind: "png" | "svg"): string {
  return scenarioFileName(`${title} budget`, kind);
}

/** "slow-recombination-budget.csv". */
export function budgetFileName(title: string): string {
  return scenarioFileName(`${title} budget`, "csv");
}

/** "slow-recombination.json": the scenario file (physics/scenario/exchange.ts). */
export function scenarioFileNameFor(title: string): string {
  return scenarioFileName(title, "json");
}
