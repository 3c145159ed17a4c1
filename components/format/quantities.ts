/**
 * SI numbers printed for people, through physics/units.ts (the one formatter), with the pairings a physicist
 * expects on a read view: masses also in solar masses when astrophysical, charges also in units of e.
 */
import { elementaryCharge, solarMass } from "@/physics/constants";
import { formatQuantity } from "@/physics/units";

export const formatLength = (metres: number) => formatQuantity(metres, "length");
export const formatDuration = (seconds: number) => formatQuantity(seconds, "time");
export const formatAcceleration = (metresPerSecondSquared: number) => formatQuantity(metresPerSecondSquared, "acceleration");
export const formatRate = (perSecond: number) => formatQuantity(perSecond, "rate");

export function formatMass(kg: number): string {
  const text = formatQuantity(kg, "mass");
  return kg >= 1e-3 * solarMass.value ? `${text} (${formatQuantity(kg, "mass", { solarMasses: true })})` : text;
}

export function formatCharge(coulombs: number): string {
  if (coulombs === 0) return "0 C";
  const inE = coulombs / elementaryCharge.value;
  const multiple = Math.abs(inE) < 1e6 ? String(Number(inE.toPrecision(6))) : inE.toExponential(2);
  return `${formatQuantity(coulombs, "charge")} (${multiple} e)`;
}

/** Full precision, for a title attribute beside a rounded value. */
export const exact = (value: number, unit: string) => `${value.toExponential()} ${unit}`;
