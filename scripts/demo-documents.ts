/**
 * The demo's five scenario documents, all invented, for scripts/seed.ts and the tests: a charged microsphere in flat
 * space; a lab hovering outside a 10 M☉ black hole; a lab accelerated at 10¹⁸ m/s²; and two with the lab's
 * environment: a charged silica microsphere in a cryogenic chamber 40 µm above a gold-coated chip, where the warm
 * (well, 4 K) metal's image noise outruns every other channel, and a neutral diamond held apart for a long time in
 * a room-temperature vacuum, where residual gas and thermal radiation dwarf the body's own gravitational field.
 */
import { elementaryCharge, solarMass } from "../physics/constants";
import { defaultScenarioDocument, type ScenarioDocument } from "../physics/scenario/schema";

const e = elementaryCharge.value;

/** Ramps of the minimum-jerk shape around a hold, each time in seconds. */
function minimumJerkSegments(separationSeconds: number, holdSeconds: number, recombinationSeconds: number): ScenarioDocument["protocol"] {
  return {
    kind: "segments",
    separation: { durationSeconds: separationSeconds, shape: "minimum-jerk" },
    hold: { durationSeconds: holdSeconds },
    recombination: { durationSeconds: recombinationSeconds, shape: "minimum-jerk" },
  };
}

export function flatSpaceStudy(): ScenarioDocument {
  return {
    ...defaultScenarioDocument(),
    source: { chargeCoulombs: 100 * e, massKg: 1e-14, labMassKg: null },
    separation: { axis: "tangential", split: "symmetric", distanceMetres: 1e-6 },
  };
}

export function hoveringLab(): ScenarioDocument {
  return {
    ...defaultScenarioDocument(),
    background: { kind: "schwarzschild", massKg: 10 * solarMass.value },
    lab: { placement: "areal-radius", arealRadiusMetres: 1.5e5 },
    source: { chargeCoulombs: 100 * e, massKg: 1e-14, labMassKg: null },
    separation: { axis: "radial", split: "symmetric", distanceMetres: 1e-5 },
    protocol: minimumJerkSegments(0.05, 1, 0.05),
  };
}

export function acceleratedLab(): ScenarioDocument {
  return {
    ...defaultScenarioDocument(),
    background: { kind: "rindler", accelerationMetresPerSecondSquared: 1e18 },
    lab: { placement: "uniformly-accelerated" },
    source: { chargeCoulombs: 10 * e, massKg: 1e-15, labMassKg: null },
    separation: { axis: "tangential", split: "one-branch-stays", distanceMetres: 5e-7 },
  };
}

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
  doc.protocol = minimumJerkSegments(0.02, 0.1, 0.02);
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
  doc.protocol = minimumJerkSegments(0.5, 10, 0.5);
  doc.environment = {
    body: { radiusMetres: radius, material: "diamond", permittivity: null, internalTemperatureKelvin: null },
    gas: { pressurePascals: 1e-6, temperatureKelvin: 295, species: "N2" },
    radiation: { surroundingsTemperatureKelvin: 295 },
    surface: null,
  };
  return doc;
}
