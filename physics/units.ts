/**
 * Quantities at the edges (forms, CLI, API): parse text with units into SI numbers and print SI numbers readably.
 * Parsing goes through a private mathjs instance with two extra units: `Msun` (M☉ = GM☉/G, IAU 2015 Resolution B3
 * nominal GM☉ and CODATA 2018 G) and `echarge` (the elementary charge, CODATA 2018). A lone unit token `e` is read
 * as `echarge`, never as Euler's number, so "1e-3 e" is a thousandth of an elementary charge. Given the background's
 * lengths, a length may also be written in r_s = 2GM/c², GM/c² or c/H ("3 rs"). Numbers print through one formatter,
 * formatNumber, whose "1.5 × 10⁶" reads back.
 */
import { all, create, type Unit } from "mathjs";
import { c, e as elementaryChargeCoulombs, epsilon0, G, hbar, planckLength, planckMass, planckTime, solarMass } from "./constants";
import { superscript } from "./superscript";

const math = create(all);
math.createUnit("Msun", { definition: `${solarMass.value} kg` });
math.createUnit("echarge", { definition: `${elementaryChargeCoulombs} C` });

export type QuantityDimension = "length" | "time" | "mass" | "charge" | "acceleration" | "rate" | "pressure" | "temperature" | "resistivity";

const DIMENSIONS: Record<QuantityDimension, { siUnit: string; example: string; article: string }> = {
  length: { siUnit: "m", example: "2.5 um", article: "a length" },
  time: { siUnit: "s", example: "250 ms", article: "a time" },
  mass: { siUnit: "kg", example: "10 Msun", article: "a mass" },
  charge: { siUnit: "C", example: "1e-3 e", article: "a charge" },
  acceleration: { siUnit: "m/s^2", example: "9.81 m/s^2", article: "an acceleration" },
  rate: { siUnit: "Hz", example: "2.2e-18 1/s", article: "a rate" },
  pressure: { siUnit: "Pa", example: "1e-6 Pa", article: "a pressure" },
  temperature: { siUnit: "K", example: "4 K", article: "a temperature (in kelvin)" },
  resistivity: { siUnit: "ohm m", example: "2.2e-8 ohm m", article: "a resistivity" },
};

/** `unit`: the named unit the text was written in (e, M☉, r_s, GM/c², c/H), so a field can echo it; absent for others. */
export type ParsedQuantity = { ok: true; valueSI: number; unit?: NamedUnit } | { ok: false; message: string };

const LEADING_NUMBER = /^([+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?)\s*(.*)$/;
const SUPERSCRIPTS: Record<string, string> = { "⁻": "-", "⁰": "0", "¹": "1", "²": "2", "³": "3", "⁴": "4", "⁵": "5", "⁶": "6", "⁷": "7", "⁸": "8", "⁹": "9" };

/**
 * Spellings mathjs does not read: Ω, micro signs, M☉, Unicode minus, superscript exponents, and a number written
 * as Branchline prints it, "2.20 × 10⁻⁸" (read as 2.20e-8, so what formatQuantity prints parses back).
 */
function normaliseSpelling(text: string): string {
  return text
    .trim()
    .replace(/Ω/g, "ohm ")
    .replace(/[µμ](?=[A-Za-z])/g, "u")
    .replace(/M☉/g, "Msun")
    .replace(/−/g, "-")
    .replace(/[⁻⁰¹²³⁴⁵⁶⁷⁸⁹]+/g, (run) => `^${[...run].map((ch) => SUPERSCRIPTS[ch]).join("")}`)
    .replace(/^([+-]?(?:\d+\.?\d*|\.\d+))\s*[×x·*]\s*10\^([+-]?\d+)/, "$1e$2");
}

/**
 * Lengths the field itself measures in, beside the metre: around a black hole its horizon radius r_s = 2GM/c² and
 * GM/c² (the geometrized mass); in de Sitter the horizon radius c/H. Known only with a background, so optional.
 */
export interface LengthScales {
  schwarzschildRadiusMetres?: number;
  hubbleRadiusMetres?: number;
}

/** Units of our own a value can be typed in and echoed back in: the elementary charge, the solar mass, and the field's lengths. */
export type NamedUnit = "e" | "M☉" | "r_s" | "GM/c²" | "c/H";

const NAMED_LENGTH_SPELLINGS: { unit: "r_s" | "GM/c²" | "c/H"; spelling: RegExp }[] = [
  { unit: "r_s", spelling: /^(?:r_?s|rₛ|r_\{s\})$/ },
  { unit: "GM/c²", spelling: /^(?:GM\/c\^?2|M)$/ },
  { unit: "c/H", spelling: /^(?:c\/H|r_?H)$/ },
];

/** Metres in one of the field's named lengths, or undefined when the background has no such length. */
function namedLengthMetres(unit: "r_s" | "GM/c²" | "c/H", scales: LengthScales): number | undefined {
  switch (unit) {
    case "r_s":
      return scales.schwarzschildRadiusMetres;
    case "GM/c²":
      return scales.schwarzschildRadiusMetres === undefined ? undefined : scales.schwarzschildRadiusMetres / 2;
    case "c/H":
      return scales.hubbleRadiusMetres;
  }
}

/** SI value of one of a named unit (undefined: a length the background does not have). */
export function namedUnitSI(unit: NamedUnit, scales: LengthScales = {}): number | undefined {
  if (unit === "e") return elementaryChargeCoulombs;
  if (unit === "M☉") return solarMass.value;
  return namedLengthMetres(unit, scales);
}

/** A value printed in a named unit, through the one number formatter: "3 r_s", "100 e", "10 M☉". */
export function formatInUnit(valueSI: number, unit: NamedUnit, scales: LengthScales = {}, digits = 4): string | null {
  const size = namedUnitSI(unit, scales);
  return size === undefined ? null : `${formatNumber(valueSI / size, digits)} ${unit}`;
}

/** A length beside the field's own lengths, for a readout next to the SI value: "= 3 r_s = 6 GM/c²", "= 0.5 c/H"; "" with none. */
export function namedLengthsText(metres: number, scales: LengthScales = {}, digits = 4): string {
  const units: ("r_s" | "GM/c²" | "c/H")[] = scales.schwarzschildRadiusMetres !== undefined ? ["r_s", "GM/c²"] : scales.hubbleRadiusMetres !== undefined ? ["c/H"] : [];
  return units.map((unit) => `= ${formatInUnit(metres, unit, scales, digits)}`).join(" ");
}

/** The unit part as mathjs reads it: a lone `e` is the elementary charge; "1/s" style reciprocals are kept. */
function readUnit(unitText: string): Unit {
  return math.unit(unitText.replace(/(?<![A-Za-z_0-9])e(?![A-Za-z_0-9])/g, "echarge"));
}

/** The named unit a unit text stands for, if it is one. */
function namedUnitOf(unitText: string, dimension: QuantityDimension): NamedUnit | undefined {
  if (dimension === "charge" && /^(?:e|echarge)$/.test(unitText)) return "e";
  if (dimension === "mass" && unitText === "Msun") return "M☉";
  if (dimension === "length") return NAMED_LENGTH_SPELLINGS.find((n) => n.spelling.test(unitText))?.unit;
  return undefined;
}

/**
 * Parse text such as "250 ms", "10 Msun", "1.5 × 10⁶ e" or (with the background's `lengthScales`) "3 rs" as a
 * quantity of the given dimension, into SI (m, s, kg, C, m s^-2, s^-1). A bare number is refused unless
 * `options.defaultUnit` says which unit it is in.
 */
export function parseQuantity(text: string, dimension: QuantityDimension, options: { defaultUnit?: string; lengthScales?: LengthScales } = {}): ParsedQuantity {
  const expected = DIMENSIONS[dimension];
  const wanted = `${expected.article} such as '${expected.example}'`;
  const match = LEADING_NUMBER.exec(normaliseSpelling(text));
  if (!match) return { ok: false, message: `expected ${wanted}, got '${text}': it should start with a number` };
  const [, numberText, written] = match;
  const unitText = written.trim() || options.defaultUnit;
  if (!unitText) return { ok: false, message: `'${text}' has no unit: write ${wanted}` };
  const named = namedUnitOf(unitText, dimension);
  if (named === "r_s" || named === "GM/c²" || named === "c/H") {
    const metres = namedLengthMetres(named, options.lengthScales ?? {});
    if (metres === undefined) {
      return { ok: false, message: `'${unitText}' is a length of ${named === "c/H" ? "a de Sitter background" : "a black-hole background"}; this one has none` };
    }
    const valueSI = Number(numberText) * metres;
    return Number.isFinite(valueSI) ? { ok: true, valueSI, unit: named } : { ok: false, message: `'${text}' is too large to represent` };
  }
  let unit: Unit;
  try {
    unit = math.multiply(Number(numberText), readUnit(unitText)) as Unit;
  } catch {
    return { ok: false, message: `expected ${wanted}, got '${text}': '${unitText}' is not a unit Branchline knows` };
  }
  if (!unit.equalBase(math.unit(expected.siUnit))) return { ok: false, message: `expected ${wanted}, got '${text}'` };
  const valueSI = unit.toNumber(expected.siUnit);
  if (!Number.isFinite(valueSI)) return { ok: false, message: `'${text}' is too large to represent` };
  return named ? { ok: true, valueSI, unit: named } : { ok: true, valueSI };
}

const PREFIXES: Record<number, string> = {
  [-24]: "y", [-21]: "z", [-18]: "a", [-15]: "f", [-12]: "p", [-9]: "n", [-6]: "µ", [-3]: "m", 0: "", 3: "k",
};

/** How each dimension prints: the unit symbol, the SI-value-to-unit factor and the prefix exponents allowed (none: bare unit). */
const PRINTING: Record<QuantityDimension, { symbol: string; perSI: number; prefixes: [number, number] | null }> = {
  length: { symbol: "m", perSI: 1, prefixes: [-15, 3] },
  time: { symbol: "s", perSI: 1, prefixes: [-18, 0] },
  mass: { symbol: "g", perSI: 1000, prefixes: [-24, 3] },
  charge: { symbol: "C", perSI: 1, prefixes: [-21, 0] },
  acceleration: { symbol: "m/s²", perSI: 1, prefixes: null },
  rate: { symbol: "s⁻¹", perSI: 1, prefixes: null },
  pressure: { symbol: "Pa", perSI: 1, prefixes: null },
  temperature: { symbol: "K", perSI: 1, prefixes: [-9, 3] },
  resistivity: { symbol: "Ω m", perSI: 1, prefixes: null },
};


/** value = mantissa × 10^exponent with exponent a multiple of `step` and |mantissa| ∈ [1, 10^step) after rounding. */
function splitEngineering(value: number, step: number, digits: number): { mantissa: string; exponent: number } {
  let exponent = Math.floor(Math.log10(Math.abs(value)) / step) * step;
  if (Math.abs(Number((value / 10 ** exponent).toPrecision(digits))) >= 10 ** step) exponent += step;
  return { mantissa: (value / 10 ** exponent).toPrecision(digits), exponent };
}

const scientific = (value: number, symbol: string, digits: number) => {
  const { mantissa, exponent } = splitEngineering(value, 1, digits);
  return exponent === 0 ? `${mantissa} ${symbol}` : `${mantissa} × 10${superscript(exponent)} ${symbol}`;
};

/**
 * Print an SI value with `digits` significant digits (default 3) and a readable SI prefix within the dimension's
 * usual range ("2.50 µm", "316 ms", "10.0 pg"), else as a power of ten ("2.20 × 10⁻¹⁸ s⁻¹"). Masses of at least
 * 0.01 M☉ print in solar masses ("10.0 M☉") when `solarMasses` is set.
 */
export function formatQuantity(valueSI: number, dimension: QuantityDimension, options: { digits?: number; solarMasses?: boolean } = {}): string {
  const digits = options.digits ?? 3;
  if (dimension === "mass" && options.solarMasses && Math.abs(valueSI) >= 0.01 * solarMass.value) {
    return `${(valueSI / solarMass.value).toPrecision(digits)} M☉`;
  }
  const { symbol, perSI, prefixes } = PRINTING[dimension];
  const value = valueSI * perSI;
  if (value === 0 || !Number.isFinite(value)) return `${value} ${symbol}`;
  if (!prefixes) {
    const plain = Math.abs(value) >= 1e-3 && Math.abs(value) < 1e4;
    return plain ? `${value.toPrecision(digits)} ${symbol}` : scientific(value, symbol, digits);
  }
  const { mantissa, exponent } = splitEngineering(value, 3, digits);
  if (exponent < prefixes[0] || exponent > prefixes[1]) {
    return dimension === "mass" ? scientific(valueSI, "kg", digits) : scientific(value, symbol, digits);
  }
  return `${mantissa} ${PREFIXES[exponent]}${symbol}`;
}

/**
 * A plain number with `digits` significant digits (default 3): as it is between 0.01 and 9999, else with its power
 * of ten written out ("6.8 × 10²⁰", "−7.52 × 10⁻⁵"). The one way Branchline prints a bare number, in fields, flags
 * and figures alike.
 */
export function formatNumber(value: number, digits = 3): string {
  if (value === 0) return "0";
  if (!Number.isFinite(value)) return Number.isNaN(value) ? "NaN" : value > 0 ? "∞" : "−∞";
  const sign = value < 0 ? "−" : "";
  const rounded = Number(Math.abs(value).toPrecision(digits));
  const exponent = Math.floor(Math.log10(rounded));
  if (exponent >= -2 && exponent <= 3) return sign + String(rounded);
  const mantissa = Number((rounded / 10 ** exponent).toPrecision(digits));
  return `${sign}${mantissa} × 10${superscript(exponent)}`;
}

/** A mass, length, time or charge in geometrized (G = c = 1) and Planck (ħ = G = c = 1, 4πε0 = 1) terms. */
export interface GeometrizedReadout {
  /** As a length: GM/c² for a mass, q√(G/(4πε0))/c² for a charge, ct for a time. */
  metres: number;
  /** As a time: the length above over c. */
  seconds: number;
  /** In Planck units: over m_P, ℓ_P, t_P or q_P = √(4πε0ħc). */
  planckUnits: number;
}

const planckChargeCoulombs = Math.sqrt(4 * Math.PI * epsilon0 * hbar * c);

/**
 * Geometrized readouts (e.g. Misner, Thorne & Wheeler, Gravitation (1973), Box 1.8 for G = c = 1; Gaussian-style
 * charge q√(G/4πε0)/c² in metres, so a Reissner–Nordström hole's charge and mass lengths compare directly).
 */
export function geometrized(valueSI: number, dimension: "mass" | "length" | "time" | "charge"): GeometrizedReadout {
  const metres = {
    mass: (G * valueSI) / c ** 2,
    length: valueSI,
    time: c * valueSI,
    charge: (valueSI * Math.sqrt(G / (4 * Math.PI * epsilon0))) / c ** 2,
  }[dimension];
  const planckUnit = { mass: planckMass, length: planckLength, time: planckTime, charge: planckChargeCoulombs }[dimension];
  return { metres, seconds: metres / c, planckUnits: valueSI / planckUnit };
}
