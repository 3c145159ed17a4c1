/**
 * The demo's two scenarios with a lab environment, both invented: a charged silica microsphere in a cryogenic
 * chamber 40 µm above a gold-coated chip, where the warm (well, 4 K) metal's image noise outruns every other channel;
 * and a neutral diamond held apart for a long time in a room-temperature vacuum, where residual gas and thermal
 * radiation dwarf the body's own gravitational field. Pure documents, for scripts/seed.ts and the tests.
 */
import { defaultScenarioDocument, type ScenarioDocument } from "../physics/scenario/schema";

const e = 1.602_176_634e-19;

/** A sphere's mass from its radius and density. */
const sphereMassKg = (radiusMetres: number, densityKgPerCubicMetre: number) => densityKgPerCubicMetre * (4 / 3) * Math.PI * radiusMetres ** 3;

/** Densities (from memory): fused silica 2200 kg/m³, diamond 3510 kg/m³ (CRC Handbook of Chemistry and Physics). */
const SILICA_DENSITY = 2200;
const DIAMOND_DENSITY = 3510;

/**
 * A 1 µm silica sphere carrying 200 e, split by 1 µm parallel to a gold-coated chip 40 µm below, in a 4 K chamber at
 * 10⁻¹⁰ Pa of helium, the sphere itself warmed to 12 K by its trapping light. The film's resistivity at 4 K is taken
 * as 5 × 10⁻⁹ Ω m: evaporated gold keeps a residual-resistance ratio of only a few (from memory).
 */
export function silicaAboveGoldChip(): ScenarioDocument {
  const doc = defaultScenarioDocument();
  const radius = 1e-6;
  doc.source = { chargeCoulombs: 200 * e, massKg: sphereMassKg(radius, SILICA_DENSITY), labMassKg: null };
  doc.separation = { axis: "tangential", split: "symmetric", distanceMetres: 1e-6 };
  doc.protocol = {
    kind: "segments",
    separation: { durationSeconds: 0.02, shape: "minimum-jerk" },
    hold: { durationSeconds: 0.1 },
    recombination: { durationSeconds: 0.02, shape: "minimum-jerk" },
  };
  doc.environment = {
    body: { radiusMetres: radius, material: "fused-silica", permittivity: null, internalTemperatureKelvin: 12 },
    gas: { pressurePascals: 1e-10, temperatureKelvin: 4, species: "He" },
    radiation: { surroundingsTemperatureKelvin: 4 },
    surface: {
      distanceMetres: 40e-6,
      resistivityOhmMetres: 5e-9,
      permittivity: null,
      temperatureKelvin: 4,
      orientation: "parallel",
      backgroundPermittivity: 1,
      relaxationTimeSeconds: null,
    },
  };
  return doc;
}

/**
 * A neutral 0.5 µm diamond, one branch moved 2 µm and held there for 10 s in a room-temperature vacuum of 10⁻⁶ Pa
 * of nitrogen: the body's own gravitational field leaks next to nothing; gas and black-body light decide.
 */
export function neutralDiamondLongHold(): ScenarioDocument {
  const doc = defaultScenarioDocument();
  const radius = 0.5e-6;
  doc.source = { chargeCoulombs: 0, massKg: sphereMassKg(radius, DIAMOND_DENSITY), labMassKg: null };
  doc.separation = { axis: "tangential", split: "one-branch-stays", distanceMetres: 2e-6 };
  doc.protocol = {
    kind: "segments",
    separation: { durationSeconds: 0.5, shape: "minimum-jerk" },
    hold: { durationSeconds: 10 },
    recombination: { durationSeconds: 0.5, shape: "minimum-jerk" },
  };
  doc.environment = {
    body: { radiusMetres: radius, material: "diamond", permittivity: null, internalTemperatureKelvin: null },
    gas: { pressurePascals: 1e-6, temperatureKelvin: 295, species: "N2" },
    radiation: { surroundingsTemperatureKelvin: 295 },
    surface: null,
  };
  return doc;
}
