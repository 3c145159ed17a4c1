/**
 * Residual-gas species: relative molecular mass and static dipole polarisability volume α/(4πε₀).
 *
 * Molecular masses from the IUPAC standard atomic weights (CIAAW, "Standard atomic weights of the elements 2021",
 * Pure Appl. Chem. 94, 573 (2022)): N 14.007, He 4.0026, H 1.008, Ar 39.95; dry air's mean molar mass 28.9644 g/mol
 * from the U.S. Standard Atmosphere 1976 (NOAA/NASA/USAF), Table 3. Polarisabilities from T. M. Miller,
 * "Atomic and molecular polarizabilities", CRC Handbook of Chemistry and Physics (values recalled from memory):
 * He 0.2050, H₂ 0.8045, N₂ 1.7403, Ar 1.6411 Å³; air as the mole-fraction mean of N₂ (0.781), O₂ (0.210, 1.5812 Å³)
 * and Ar (0.009). He and Ar agree within 0.3 % with the recommended values of P. Schwerdtfeger & J. K. Nagle,
 * Mol. Phys. 117, 1200 (2019) (checked in tests/unit/physics/environment/species.test.ts); the molecules' are not
 * in that table. The polarisability is carried for the van der Waals cross-section of very small bodies, which
 * the hard-sphere estimator does not use (see gas.ts); the mass enters every rate.
 */
import { atomicMassConstant } from "../constants";

export type GasSpecies = "N2" | "He" | "H2" | "Ar" | "air";

export interface GasSpeciesEntry {
  name: string;
  relativeMolecularMass: number;
  /** Static polarisability volume α/(4πε₀), m³. */
  polarisabilityVolumeCubicMetres: number;
  reference: string;
}

const ANGSTROM_CUBED = 1e-30;
const MASS_SOURCE = "IUPAC/CIAAW standard atomic weights 2021, Pure Appl. Chem. 94, 573 (2022)";
const POLARISABILITY_SOURCE = "T. M. Miller, CRC Handbook of Chemistry and Physics, 'Atomic and molecular polarizabilities' (from memory)";

export const gasSpecies: Readonly<Record<GasSpecies, GasSpeciesEntry>> = {
  N2: { name: "nitrogen N₂", relativeMolecularMass: 2 * 14.007, polarisabilityVolumeCubicMetres: 1.7403 * ANGSTROM_CUBED, reference: `${MASS_SOURCE}; ${POLARISABILITY_SOURCE}` },
  He: { name: "helium", relativeMolecularMass: 4.0026, polarisabilityVolumeCubicMetres: 0.205 * ANGSTROM_CUBED, reference: `${MASS_SOURCE}; ${POLARISABILITY_SOURCE}` },
  H2: { name: "hydrogen H₂", relativeMolecularMass: 2 * 1.008, polarisabilityVolumeCubicMetres: 0.8045 * ANGSTROM_CUBED, reference: `${MASS_SOURCE}; ${POLARISABILITY_SOURCE}` },
  Ar: { name: "argon", relativeMolecularMass: 39.95, polarisabilityVolumeCubicMetres: 1.6411 * ANGSTROM_CUBED, reference: `${MASS_SOURCE}; ${POLARISABILITY_SOURCE}` },
  air: {
    name: "dry air",
    relativeMolecularMass: 28.9644,
    polarisabilityVolumeCubicMetres: (0.781 * 1.7403 + 0.21 * 1.5812 + 0.009 * 1.6411) * ANGSTROM_CUBED,
    reference: `U.S. Standard Atmosphere 1976 (mean molar mass); ${POLARISABILITY_SOURCE}, mole-fraction mean`,
  },
};

/** Mass of one molecule, kg. */
export function molecularMassKg(species: GasSpecies): number {
  return gasSpecies[species].relativeMolecularMass * atomicMassConstant.value;
}
