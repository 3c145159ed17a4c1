/**
 * Physical constants in SI units, each with its symbol, unit, standard uncertainty and reference.
 *
 * Base values: CODATA 2018 (E. Tiesinga et al., "CODATA recommended values of the fundamental physical
 * constants: 2018", Rev. Mod. Phys. 93, 025010 (2021)). Solar values: IAU 2015 Resolution B3 nominal
 * conversion constants (Prša et al., AJ 152, 41 (2016)). Derived constants are computed, never retyped.
 */

export interface PhysicalConstant {
  readonly symbol: string;
  readonly name: string;
  readonly value: number;
  readonly unit: string;
  /** One-standard-deviation uncertainty in the same unit; 0 for exact values. */
  readonly uncertainty: number;
  readonly reference: string;
}

const CODATA_2018 = "CODATA 2018, Rev. Mod. Phys. 93, 025010 (2021)";
const IAU_2015_B3 = "IAU 2015 Resolution B3 (nominal solar values), AJ 152, 41 (2016)";

function constant(c: PhysicalConstant): PhysicalConstant {
  return Object.freeze(c);
}

export const speedOfLight = constant({
  symbol: "c", name: "speed of light in vacuum", value: 299_792_458, unit: "m s^-1", uncertainty: 0,
  reference: `${CODATA_2018} (exact)`,
});

export const planckConstant = constant({
  symbol: "h", name: "Planck constant", value: 6.626_070_15e-34, unit: "J s", uncertainty: 0,
  reference: `${CODATA_2018} (exact)`,
});

export const reducedPlanckConstant = constant({
  symbol: "ħ", name: "reduced Planck constant", value: planckConstant.value / (2 * Math.PI), unit: "J s",
  uncertainty: 0, reference: `derived: h / 2π, ${CODATA_2018}`,
});

export const elementaryCharge = constant({
  symbol: "e", name: "elementary charge", value: 1.602_176_634e-19, unit: "C", uncertainty: 0,
  reference: `${CODATA_2018} (exact)`,
});

export const boltzmannConstant = constant({
  symbol: "k_B", name: "Boltzmann constant", value: 1.380_649e-23, unit: "J K^-1", uncertainty: 0,
  reference: `${CODATA_2018} (exact)`,
});

export const vacuumPermittivity = constant({
  symbol: "ε0", name: "vacuum electric permittivity", value: 8.854_187_8128e-12, unit: "F m^-1",
  uncertainty: 0.000_000_0013e-12, reference: CODATA_2018,
});

export const vacuumPermeability = constant({
  symbol: "μ0", name: "vacuum magnetic permeability", value: 1.256_637_062_12e-6, unit: "N A^-2",
  uncertainty: 0.000_000_000_19e-6, reference: CODATA_2018,
});

export const gravitationalConstant = constant({
  symbol: "G", name: "Newtonian constant of gravitation", value: 6.674_30e-11, unit: "m^3 kg^-1 s^-2",
  uncertainty: 0.000_15e-11, reference: CODATA_2018,
});

export const atomicMassConstant = constant({
  symbol: "m_u", name: "atomic mass constant", value: 1.660_539_066_60e-27, unit: "kg",
  uncertainty: 0.000_000_000_50e-27, reference: CODATA_2018,
});

export const electronMass = constant({
  symbol: "m_e", name: "electron mass", value: 9.109_383_7015e-31, unit: "kg",
  uncertainty: 0.000_000_0028e-31, reference: CODATA_2018,
});

export const standardGravity = constant({
  symbol: "g_n", name: "standard acceleration of gravity", value: 9.806_65, unit: "m s^-2", uncertainty: 0,
  reference: `${CODATA_2018}, adopted value (exact)`,
});

export const nominalSolarMassParameter = constant({
  symbol: "GM☉", name: "nominal solar mass parameter", value: 1.327_124_4e20, unit: "m^3 s^-2",
  uncertainty: 0, reference: `${IAU_2015_B3} (exact by definition)`,
});

export const solarMass = constant({
  symbol: "M☉", name: "solar mass (from the nominal GM☉ and CODATA G)",
  value: nominalSolarMassParameter.value / gravitationalConstant.value, unit: "kg",
  uncertainty: (nominalSolarMassParameter.value / gravitationalConstant.value) *
    (gravitationalConstant.uncertainty / gravitationalConstant.value),
  reference: `derived: GM☉ / G, ${IAU_2015_B3}; ${CODATA_2018}`,
});

/** Planck units (ħ = c = G = 1), derived from the constants above. */
export const planckLength = Math.sqrt((reducedPlanckConstant.value * gravitationalConstant.value) / speedOfLight.value ** 3);
export const planckTime = planckLength / speedOfLight.value;
export const planckMass = Math.sqrt((reducedPlanckConstant.value * speedOfLight.value) / gravitationalConstant.value);

/** Short aliases for formulas; the records above carry the provenance. */
export const c = speedOfLight.value;
export const h = planckConstant.value;
export const hbar = reducedPlanckConstant.value;
export const e = elementaryCharge.value;
export const kB = boltzmannConstant.value;
export const epsilon0 = vacuumPermittivity.value;
export const mu0 = vacuumPermeability.value;
export const G = gravitationalConstant.value;

export const allConstants: readonly PhysicalConstant[] = [
  speedOfLight, planckConstant, reducedPlanckConstant, elementaryCharge, boltzmannConstant, vacuumPermittivity,
  vacuumPermeability, gravitationalConstant, atomicMassConstant, electronMass, standardGravity, nominalSolarMassParameter,
  solarMass,
];
