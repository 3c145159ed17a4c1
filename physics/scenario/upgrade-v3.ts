/**
 * Version 2 → 3: names that say what things are. Nothing is computed differently.
 * - ramp shape "smoothstep" → "cubic" (the cubic 3u² − 2u³);
 * - a Rindler lab's placement "inertial" → "uniformly-accelerated" (the Rindler lab is accelerated, not inertial);
 * - a de Sitter lab's placement "inertial" → "areal-radius" at 0 (the static geodesic observer at the centre);
 * - placement "proper-distance-above-horizon" → "proper-distance-from-horizon" (de Sitter labs sit inward of theirs).
 * A document that does not have the expected shape is passed on unchanged, for the schema to say what is wrong.
 */
type Raw = Record<string, unknown>;

const isObject = (value: unknown): value is Raw => typeof value === "object" && value !== null && !Array.isArray(value);

function renameShape(segment: unknown): unknown {
  return isObject(segment) && segment.shape === "smoothstep" ? { ...segment, shape: "cubic" } : segment;
}

function upgradeProtocol(protocol: unknown): unknown {
  if (!isObject(protocol) || protocol.kind !== "segments") return protocol;
  return { ...protocol, separation: renameShape(protocol.separation), recombination: renameShape(protocol.recombination) };
}

function upgradeLab(lab: unknown, background: unknown): unknown {
  if (!isObject(lab)) return lab;
  const kind = isObject(background) ? background.kind : undefined;
  if (lab.placement === "inertial" && kind === "rindler") return { placement: "uniformly-accelerated" };
  if (lab.placement === "inertial" && kind === "de-sitter") return { placement: "areal-radius", arealRadiusMetres: 0 };
  if (lab.placement === "proper-distance-above-horizon") return { ...lab, placement: "proper-distance-from-horizon" };
  return lab;
}

export function upgradeVersion2To3(doc: Raw): Raw {
  return { ...doc, schemaVersion: 3, lab: upgradeLab(doc.lab, doc.background), protocol: upgradeProtocol(doc.protocol) };
}
