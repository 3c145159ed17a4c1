/**
 * A scenario document's leaves in words, for comparing two revisions: "protocol.hold.durationSeconds" reads as
 * "Protocol › hold › duration", and its value as "100 ms". The unit comes from the field's name, which the
 * scenario schema spells out in SI (…Metres, …Seconds, …Kg, …Coulombs, …MetresPerSecondSquared, …PerSecond; the
 * environment's …Pascals, …Kelvin, …OhmMetres, …Hertz).
 */
import { formatAcceleration, formatCharge, formatDuration, formatLength, formatMass, formatRate } from "@/components/format/quantities";
import { formatQuantity } from "@/physics/units";

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
  if (typeof value === "string") return value;
  if (typeof value === "object" && value !== null && "items" in value) return `${(value as { items: number }).items.toLocaleString("en")} items`;
  return JSON.stringify(value);
}
