/**
 * A scenario document's leaves in the editor's own words, for comparing two versions: "protocol.hold.durationSeconds"
 * reads as "Hold › duration" and its value as "100 ms"; "separation.split" as "Split", "one-branch-stays" as
 * "branch B stays". Paths the editor has no field for fall back to their key in words ("Protocol › samples › #1");
 * the unit comes from the field's name, which the scenario schema spells out in SI (…Metres, …Seconds, …Kg, …; the
 * environment's …Pascals, …Kelvin, …OhmMetres, …Hertz).
 */
import { formatAcceleration, formatCharge, formatDuration, formatLength, formatMass, formatRate } from "@/components/format/quantities";
import { formatQuantity } from "@/physics/units";
import { backgroundNames, placementNames, protocolKindNames, rampShapeNames, splitNames } from "@/components/format/words";

/** The editor's label of each field of the document. */
const FIELD_WORDS: Record<string, string> = {
  "background.kind": "Background",
  "background.massKg": "Black-hole mass",
  "background.accelerationMetresPerSecondSquared": "Lab acceleration",
  "background.hubbleRatePerSecond": "Hubble rate H",
  "lab.placement": "Place the lab by",
  "lab.arealRadiusMetres": "Lab areal radius",
  "lab.properDistanceMetres": "Lab proper distance from the horizon",
  "source.chargeCoulombs": "Charge",
  "source.massKg": "Source mass",
  "source.labMassKg": "Lab mass",
  "separation.axis": "Separation axis",
  "separation.split": "Split",
  "separation.distanceMetres": "Full separation d",
  "separation.bodyOffsetMetres": "Body offset x₀",
  "protocol.kind": "Kind of protocol",
  "protocol.separation.durationSeconds": "Separation › duration",
  "protocol.separation.shape": "Separation › ramp shape",
  "protocol.hold.durationSeconds": "Hold › duration",
  "protocol.recombination.durationSeconds": "Recombination › duration",
  "protocol.recombination.shape": "Recombination › ramp shape",
  "protocol.expression": "Formula σ(t)",
  "protocol.durationSeconds": "Profile duration",
  "protocol.interpolation": "Interpolation",
  "protocol.samples": "Measured profile › samples",
  "display.theme": "Figure theme",
  "display.showGrid": "Grid",
  "numerics.kinkTimeResolutionSeconds": "Kink time resolution",
  schemaVersion: "Schema version",
};

/** The editor's words for the values of fields that take one of a few names. */
const VALUE_WORDS: Record<string, Record<string, string>> = {
  "background.kind": backgroundNames,
  "lab.placement": placementNames,
  "separation.split": splitNames,
  "protocol.kind": protocolKindNames,
  "protocol.separation.shape": rampShapeNames,
  "protocol.recombination.shape": rampShapeNames,
  "protocol.interpolation": { linear: "linear", "cubic-spline": "cubic spline" },
};

const unitSuffixes: [suffix: string, format: (value: number) => string][] = [
  ["MetresPerSecondSquared", formatAcceleration],
  ["PerSecond", formatRate],
  ["OhmMetres", (v) => formatQuantity(v, "resistivity")],
  ["Metres", formatLength],
  ["Pascals", (v) => formatQuantity(v, "pressure")],
  ["Kelvin", (v) => formatQuantity(v, "temperature")],
  ["Hertz", (v) => formatQuantity(v, "rate")],
  ["Seconds", formatDuration],
  ["Kg", formatMass],
  ["Coulombs", formatCharge],
];

const words = (key: string) => key.replace(/([a-z])([A-Z])/g, "$1 $2").toLowerCase();

function unitOf(path: string): ((value: number) => string) | null {
  const key = path.split(".").pop() ?? "";
  return unitSuffixes.find(([suffix]) => key.endsWith(suffix) && key !== suffix)?.[1] ?? null;
}

/** "protocol.hold.durationSeconds" → "Protocol › hold › duration"; array items by their number from 1. */
export function parameterLabel(path: string): string {
  if (!path) return "Whole document";
  if (FIELD_WORDS[path]) return FIELD_WORDS[path];
  const parts = path.split(".").map((part) => {
    if (/^\d+$/.test(part)) return `#${Number(part) + 1}`;
    const suffix = unitSuffixes.find(([s]) => part.endsWith(s) && part !== s)?.[0];
    return words(suffix ? part.slice(0, -suffix.length) : part);
  });
  const text = parts.join(" › ");
  return text.charAt(0).toUpperCase() + text.slice(1);
}

/** A leaf's value with its unit; "—" where the version has no such parameter. */
export function parameterValue(path: string, value: unknown, present = true): string {
  if (!present) return "—";
  if (value === null) return "none";
  if (typeof value === "boolean") return value ? "yes" : "no";
  if (typeof value === "number") return unitOf(path)?.(value) ?? String(value);
  if (typeof value === "string") return VALUE_WORDS[path]?.[value] ?? value;
  if (typeof value === "object" && value !== null && "items" in value) return `${(value as { items: number }).items.toLocaleString("en")} items`;
  return JSON.stringify(value);
}
