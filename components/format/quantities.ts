/**
 * SI numbers printed for people: a few significant figures, an SI prefix where one reads naturally, and
 * scientific notation where none does (1.0 µm, 10 ms, 1.99e31 kg). Display only; values are never parsed back.
 */
import { elementaryCharge, solarMass } from "@/physics/constants";

const prefixes: Record<number, string> = { [-15]: "f", [-12]: "p", [-9]: "n", [-6]: "µ", [-3]: "m", 0: "", 3: "k" };

/** Three significant figures, trailing zeros dropped, but never a bare single digit ("1.0", not "1"). */
export function significant(value: number, digits = 3): string {
  let text = Number(value.toPrecision(digits)).toString();
  if (/^-?\d$/.test(text)) text += ".0";
  return text;
}

/** Scientific notation as "1.99e31"; plain digits when the exponent is small. */
export function scientific(value: number, digits = 3): string {
  if (value === 0) return "0";
  const exponent = Math.floor(Math.log10(Math.abs(value)));
  if (exponent >= -2 && exponent <= 3) return significant(value, digits);
  const mantissa = value / 10 ** exponent;
  const rounded = Number(mantissa.toPrecision(digits));
  // 9.996e5 rounds to a mantissa of 10: carry into the exponent.
  if (Math.abs(rounded) >= 10) return `${significant(rounded / 10, digits)}e${exponent + 1}`;
  return `${significant(rounded, digits)}e${exponent}`;
}

/**
 * A value with an SI prefix on `unit` between femto and kilo (`maxPrefixExponent` caps the top, e.g. 0 for
 * seconds); outside that range, plain unit and scientific notation.
 */
export function withPrefix(value: number, unit: string, maxPrefixExponent = 3): string {
  if (value === 0) return `0 ${unit}`;
  const exponent = Math.floor(Math.log10(Math.abs(value)) / 3) * 3;
  if (exponent < -15 || exponent > maxPrefixExponent) {
    const fitsPlain = exponent > maxPrefixExponent && Math.abs(value) < 1e4 * 10 ** maxPrefixExponent;
    const scaled = fitsPlain ? value / 10 ** maxPrefixExponent : value;
    return `${fitsPlain ? significant(scaled) : scientific(value)} ${fitsPlain ? prefixes[maxPrefixExponent] : ""}${unit}`;
  }
  let mantissa = Number((value / 10 ** exponent).toPrecision(3));
  let shown = exponent;
  if (Math.abs(mantissa) >= 1000 && prefixes[exponent + 3] !== undefined && exponent + 3 <= maxPrefixExponent) {
    mantissa /= 1000;
    shown += 3;
  }
  return `${significant(mantissa)} ${prefixes[shown]}${unit}`;
}

export const formatLength = (metres: number) => withPrefix(metres, "m", 3);
export const formatDuration = (seconds: number) => withPrefix(seconds, "s", 0);

export function formatMass(kg: number): string {
  const text = `${scientific(kg)} kg`;
  // Astrophysical masses read better in solar masses as well.
  return kg >= 1e-3 * solarMass.value ? `${text} (${Number((kg / solarMass.value).toPrecision(3)).toFixed(1)} M☉)` : text;
}

export function formatCharge(coulombs: number): string {
  if (coulombs === 0) return "0 C";
  const inE = coulombs / elementaryCharge.value;
  return `${scientific(coulombs)} C (${Math.abs(inE) < 1e6 ? significant(inE, 6) : scientific(inE)} e)`;
}

export const formatAcceleration = (metresPerSecondSquared: number) => `${scientific(metresPerSecondSquared)} m/s²`;
export const formatRate = (perSecond: number) => `${scientific(perSecond)} s⁻¹`;

/** Full precision, for a title attribute beside a rounded value. */
export const exact = (value: number, unit: string) => `${value.toExponential()} ${unit}`;
