const SUPERSCRIPT_DIGITS = "⁰¹²³⁴⁵⁶⁷⁸⁹";

/** An integer as superscript digits, e.g. −18 → "⁻¹⁸" (for powers of ten and unit exponents in printed text). */
export const superscript = (n: number) => `${n < 0 ? "⁻" : ""}${[...String(Math.abs(n))].map((d) => SUPERSCRIPT_DIGITS[Number(d)]).join("")}`;
