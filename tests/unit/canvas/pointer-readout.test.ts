/**
 * The Diagram's pointer readout (canvas/kernels/diagram/pointer-readout.ts): on the lab's worldline it gives the
 * lab's proper time τ from the start of the separation, inverting the map the protocol is drawn with.
 */
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { pointerReadout } from "@/canvas/kernels/diagram/pointer-readout";
import { drawnTime, labProperTime } from "@/canvas/kernels/diagram/protocol-path";
import { buildDiagramScene, type DiagramScene } from "@/canvas/kernels/diagram/scene";
import { fitDiagramViewport, toPx } from "@/canvas/kernels/diagram/viewport";
import { compactQuantity } from "@/canvas/kernels/diagram/labels";
import { schwarzschildRadiusMetres } from "@/physics/backgrounds";
import { c } from "@/physics/constants";
import { defaultScenarioDocument, type ScenarioDocument } from "@/physics/scenario/schema";

const base = defaultScenarioDocument();
const SOLAR_MASS_KG = 1.989e30; // IAU 2015 nominal GM☉/G, rounded (from memory)

function segments(document: ScenarioDocument, separation: number, hold: number, recombination: number): ScenarioDocument {
  return {
    ...document,
    protocol: { kind: "segments", separation: { durationSeconds: separation, shape: "linear" }, hold: { durationSeconds: hold }, recombination: { durationSeconds: recombination, shape: "linear" } },
  };
}

function sceneOf(document: ScenarioDocument): DiagramScene {
  const outcome = buildDiagramScene(document);
  if (!outcome.ok) throw new Error(outcome.issue.message);
  return outcome.scene;
}

const blackHole = (radii: number): ScenarioDocument => {
  const massKg = 10 * SOLAR_MASS_KG;
  return { ...base, background: { kind: "schwarzschild", massKg }, lab: { placement: "areal-radius", arealRadiusMetres: radii * schwarzschildRadiusMetres(massKg) } };
};

describe("the lab's proper time read off the Diagram", () => {
  it("ticks slower than Killing time by √(1 − r_s/r) at a static lab outside a black hole", () => {
    // Static observer in Schwarzschild: dτ = √(1 − r_s/r) dt (e.g. Carroll, Spacetime and Geometry, §5.4; from memory).
    const scene = sceneOf(segments(blackHole(3), 1e-4, 1e-4, 1e-4));
    const protocol = scene.protocol!;
    expect(protocol.timeScale.kind).toBe("true");
    expect(protocol.timeScale.warp).toBeUndefined();
    const dt = 2e-5;
    const dtau = labProperTime(scene.chart, protocol.timeScale, protocol.totalSeconds, dt) - labProperTime(scene.chart, protocol.timeScale, protocol.totalSeconds, 0);
    expect(dtau / dt).toBeCloseTo(Math.sqrt(1 - 1 / 3), 12);
    // The protocol is drawn centred on t = 0: its middle is there.
    expect(labProperTime(scene.chart, protocol.timeScale, protocol.totalSeconds, 0)).toBeCloseTo(1.5e-4, 15);
  });

  const logUniform = (lowExp: number, highExp: number) => fc.double({ min: lowExp, max: highExp, noNaN: true }).map((e) => 10 ** e);
  const documents = fc.oneof(
    fc.constant(base),
    logUniform(0.05, 2).map(blackHole),
    logUniform(0, 18).map((a): ScenarioDocument => ({ ...base, background: { kind: "rindler", accelerationMetresPerSecondSquared: a }, lab: { placement: "uniformly-accelerated" } })),
    logUniform(-18, -9).map((H): ScenarioDocument => ({ ...base, background: { kind: "de-sitter", hubbleRatePerSecond: H }, lab: { placement: "areal-radius", arealRadiusMetres: (0.6 * c) / H } })),
  );

  it("undoes the drawing's rescaling and warping: the τ read at a drawn instant is the τ drawn there, on every background", () => {
    fc.assert(
      fc.property(documents, logUniform(-6, 2), logUniform(-6, 3), logUniform(-6, 2), fc.double({ min: 0, max: 1, noNaN: true }), (document, s, h, r, share) => {
        const scene = sceneOf(segments(document, s, h, r));
        const protocol = scene.protocol!;
        const tau = share * protocol.totalSeconds;
        const drawn = drawnTime(scene.chart, protocol.timeScale, protocol.totalSeconds, tau);
        expect(labProperTime(scene.chart, protocol.timeScale, protocol.totalSeconds, drawn)).toBeCloseTo(tau, 9 - Math.max(0, Math.ceil(Math.log10(protocol.totalSeconds))));
      }),
      { numRuns: 120 },
    );
  });

  it("says τ with its unit where the pointer is on the lab's worldline, and only the coordinates elsewhere", () => {
    const scene = sceneOf(segments(blackHole(3), 1e-4, 1e-4, 1e-4));
    const viewport = fitDiagramViewport(scene.bounds, { width: 800, height: 600 }, { left: 48, right: 48, top: 48, bottom: 48 });
    const protocol = scene.protocol!;
    const tSeconds = drawnTime(scene.chart, protocol.timeScale, protocol.totalSeconds, 1e-4);
    const background = scene.chart.background;
    const onLab = toPx(viewport, background.conformal.toDiagram(tSeconds, background.labRadiusMetres));
    const coordinates = { tSeconds, rMetres: background.labRadiusMetres };
    expect(pointerReadout(scene, viewport, onLab, coordinates)).toContain(`τ = ${compactQuantity(1e-4, "time")}`);
    expect(pointerReadout(scene, viewport, onLab, coordinates)).toMatch(/τ = 100 µs/);
    const off = { x: onLab.x + 40, y: onLab.y };
    expect(pointerReadout(scene, viewport, off, { tSeconds, rMetres: background.labRadiusMetres * 1.5 })).not.toContain("τ");
    expect(pointerReadout(scene, viewport, off, null)).toBe("outside the lab's static region");
  });
});
