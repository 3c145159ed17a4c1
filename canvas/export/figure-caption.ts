/**
 * The caption line of an exported figure: what a reader needs to know the scenario from the figure alone, in SI with
 * units — background, lab, source, separation and protocol — as parts joined by " · " (so a long caption breaks
 * between parts, never inside one). Pure: a document in, words out.
 */
import { c } from "@/physics/constants";
import { schwarzschildRadiusMetres } from "@/physics/backgrounds";
import type { ScenarioDocument } from "@/physics/scenario/schema";
import { formatQuantity } from "@/physics/units";

const q = formatQuantity;
const ratio = (value: number) => String(Number(value.toPrecision(3)));

/** A formula may run to 2000 characters; the caption shows its start. */
const FORMULA_SHOWN = 80;
const shortened = (text: string) => (text.length > FORMULA_SHOWN ? `${text.slice(0, FORMULA_SHOWN - 1)}…` : text);

function backgroundPart(document: ScenarioDocument): string {
  const b = document.background;
  switch (b.kind) {
    case "minkowski":
      return "Minkowski";
    case "schwarzschild":
      return `Schwarzschild, M = ${q(b.massKg, "mass")} (${q(b.massKg, "mass", { solarMasses: true })}), rₛ = ${q(schwarzschildRadiusMetres(b.massKg), "length")}`;
    case "rindler":
      return `Rindler wedge, a = ${q(b.accelerationMetresPerSecondSquared, "acceleration")} (c²/a = ${q((c * c) / b.accelerationMetresPerSecondSquared, "length")})`;
    case "de-sitter":
      return `de Sitter static patch, H = ${q(b.hubbleRatePerSecond, "rate")} (c/H = ${q(c / b.hubbleRatePerSecond, "length")})`;
  }
}

function labPart(document: ScenarioDocument): string {
  const { background: b, lab } = document;
  switch (lab.placement) {
    case "inertial":
      return "lab inertial";
    case "uniformly-accelerated":
      return "lab uniformly accelerated, at c²/a from the horizon";
    case "areal-radius": {
      const r = lab.arealRadiusMetres;
      if (b.kind === "schwarzschild") return `lab at r = ${q(r, "length")} (r/rₛ = ${ratio(r / schwarzschildRadiusMetres(b.massKg))})`;
      if (b.kind === "de-sitter") return `lab at r = ${q(r, "length")} (rH/c = ${ratio((r * b.hubbleRatePerSecond) / c)})`;
      return `lab at r = ${q(r, "length")}`;
    }
    case "proper-distance-from-horizon":
      return `lab ${q(lab.properDistanceMetres, "length")} of proper distance ${b.kind === "de-sitter" ? "inward from" : "above"} the horizon`;
  }
}

function sourcePart(document: ScenarioDocument): string {
  const s = document.source;
  const lab = s.labMassKg === null ? "" : `, lab mass ${q(s.labMassKg, "mass")}`;
  return `source q = ${q(s.chargeCoulombs, "charge")}, m = ${q(s.massKg, "mass")}${lab}`;
}

function separationPart(document: ScenarioDocument): string {
  const s = document.separation;
  return `separation d = ${q(s.distanceMetres, "length")}, ${s.axis}, ${s.split === "symmetric" ? "symmetric" : "one branch stays"}`;
}

function protocolPart(document: ScenarioDocument): string {
  const p = document.protocol;
  switch (p.kind) {
    case "segments":
      return `protocol: separation ${q(p.separation.durationSeconds, "time")} (${p.separation.shape}), hold ${q(p.hold.durationSeconds, "time")}, recombination ${q(
        p.recombination.durationSeconds,
        "time",
      )} (${p.recombination.shape})`;
    case "formula":
      return `protocol: σ(t) = ${shortened(p.expression)} over ${q(p.durationSeconds, "time")}`;
    case "sampled": {
      // A loop, not Math.max(...times): a profile may hold a million samples.
      let [first, last] = [Infinity, -Infinity];
      for (const s of p.samples) [first, last] = [Math.min(first, s.timeSeconds), Math.max(last, s.timeSeconds)];
      return `protocol: ${p.samples.length} measured samples over ${q(last - first, "time")} (${p.interpolation} interpolation)`;
    }
  }
}

export const CAPTION_SEPARATOR = " · ";

/** The caption's parts, in reading order. */
export function figureCaptionParts(document: ScenarioDocument): string[] {
  return [backgroundPart(document), labPart(document), sourcePart(document), separationPart(document), protocolPart(document)];
}

export function figureCaption(document: ScenarioDocument): string {
  return figureCaptionParts(document).join(CAPTION_SEPARATOR);
}
