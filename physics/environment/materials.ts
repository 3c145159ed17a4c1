/**
 * The body's material, by its relative permittivity ε at thermal-infrared frequencies, and the Clausius–Mossotti
 * factor χ = (ε − 1)/(ε + 2) of a small sphere (polarisability α = 4πε₀R³χ; J. D. Jackson, Classical
 * Electrodynamics, 3rd ed., §4.4). A perfect conductor is the limit ε → ∞, χ = 1.
 *
 * The table gives one ε per material for the whole thermal band: real materials disperse strongly there (silica's
 * Si–O phonon bands near 9 and 21 µm), so a table value is an order-of-magnitude input, flagged as such.
 * Values (from memory): fused silica ε ≈ 5.7 + 0.2i, as used for silica nanospheres by O. Romero-Isart,
 * PRA 84, 052121 (2011); diamond 5.7 and silicon 11.7, the static dielectric constants listed in the CRC Handbook
 * of Chemistry and Physics ("Properties of semiconductors"), both nearly lossless in the mid-infrared: their
 * imaginary part is taken as 0 here, so absorption and emission vanish unless the user gives ε himself.
 */
export type BodyMaterial = "fused-silica" | "diamond" | "silicon" | "perfect-conductor";

export interface Permittivity {
  real: number;
  imaginary: number;
}

export interface MaterialEntry {
  name: string;
  /** null for the perfect conductor (ε → ∞). */
  permittivity: Permittivity | null;
  reference: string;
}

export const bodyMaterials: Readonly<Record<BodyMaterial, MaterialEntry>> = {
  "fused-silica": { name: "fused silica", permittivity: { real: 5.7, imaginary: 0.2 }, reference: "O. Romero-Isart, PRA 84, 052121 (2011) (value from memory)" },
  diamond: { name: "diamond", permittivity: { real: 5.7, imaginary: 0 }, reference: "CRC Handbook of Chemistry and Physics, static dielectric constant (from memory); loss taken as 0" },
  silicon: { name: "silicon", permittivity: { real: 11.7, imaginary: 0 }, reference: "CRC Handbook of Chemistry and Physics, static dielectric constant (from memory); loss taken as 0" },
  "perfect-conductor": { name: "perfect conductor", permittivity: null, reference: "limit ε → ∞ of the Clausius–Mossotti factor" },
};

export interface ClausiusMossotti {
  real: number;
  imaginary: number;
  /** |χ|². */
  modulusSquared: number;
}

/** χ = (ε − 1)/(ε + 2) for complex ε; χ = 1 for a perfect conductor (null). */
export function clausiusMossotti(permittivity: Permittivity | null): ClausiusMossotti {
  if (permittivity === null) return { real: 1, imaginary: 0, modulusSquared: 1 };
  const { real: a, imaginary: b } = permittivity;
  const denominator = (a + 2) ** 2 + b * b;
  const real = ((a - 1) * (a + 2) + b * b) / denominator;
  const imaginary = (3 * b) / denominator;
  return { real, imaginary, modulusSquared: real * real + imaginary * imaginary };
}
