/**
 * A cursor on lab time for the Diagram (the embed's scrubber): where on the lab's worldline an instant of the
 * protocol is drawn, and the protocol cut there: the branches end at the cursor, and each radiation strip keeps
 * only what was emitted before it (for light leaving outward, T − X stays constant along a ray; inward, T + X).
 */
import type { DiagramPoint } from "@/physics/backgrounds";
import { type BranchSample, drawnTime, type ProtocolOnDiagram } from "../kernels/diagram/protocol-path";
import type { DiagramScene } from "../kernels/diagram/scene";

export interface TimeCursor {
  /** Lab proper time from the start of the separation, seconds. */
  tauSeconds: number;
  /** Where that instant is drawn on the lab's worldline. */
  point: DiagramPoint;
}

/**
 * The drawn point of lab time τ. The protocol is drawn centred on t = 0, with lab proper time turned into Killing
 * time by the lab's redshift factor and, near a horizon, compressed or stretched by the scene's time scale: the map
 * the branches are drawn with (drawnTime).
 */
export function timeCursor(scene: DiagramScene, totalSeconds: number, tauSeconds: number): TimeCursor {
  const background = scene.chart.background;
  const drawn = drawnTime(scene.chart, scene.protocol?.timeScale ?? { kind: "true" }, totalSeconds, tauSeconds);
  return { tauSeconds, point: background.conformal.toDiagram(drawn, background.labRadiusMetres) };
}

/** Keeps the part of a polygon where keep(p) ≥ 0 (one Sutherland–Hodgman pass against a straight edge). */
function clipToHalfPlane(polygon: DiagramPoint[], keep: (p: DiagramPoint) => number): DiagramPoint[] {
  const out: DiagramPoint[] = [];
  for (let i = 0; i < polygon.length; i++) {
    const current = polygon[i];
    const previous = polygon[(i + polygon.length - 1) % polygon.length];
    const [kc, kp] = [keep(current), keep(previous)];
    if ((kc >= 0) !== (kp >= 0)) {
      const s = kp / (kp - kc);
      out.push({ T: previous.T + s * (current.T - previous.T), X: previous.X + s * (current.X - previous.X) });
    }
    if (kc >= 0) out.push(current);
  }
  return out;
}

/** Whether a background's horizon strip leaves the lab outward (de Sitter) or inward (the others). */
function horizonGoesOutward(scene: DiagramScene): boolean {
  return scene.chart.background.kind === "de-sitter";
}

export function cutAtCursor(scene: DiagramScene, cursor: TimeCursor): ProtocolOnDiagram | null {
  const protocol = scene.protocol;
  if (!protocol) return null;
  const c = cursor.point;
  const before: BranchSample[] = [];
  for (const sample of protocol.branches) {
    if (sample.point.T <= c.T) {
      before.push(sample);
      continue;
    }
    const last = before[before.length - 1];
    if (last) {
      // The cursor falls between two samples: end the branches exactly there.
      const s = (c.T - last.point.T) / (sample.point.T - last.point.T);
      const lerp = (p: DiagramPoint, q: DiagramPoint) => ({ T: p.T + s * (q.T - p.T), X: p.X + s * (q.X - p.X) });
      before.push({
        point: c,
        a: last.a + s * (sample.a - last.a),
        b: last.b + s * (sample.b - last.b),
        pointA: lerp(last.pointA, sample.pointA),
        pointB: lerp(last.pointB, sample.pointB),
      });
    }
    break;
  }
  const outgoing = (p: DiagramPoint) => c.T - c.X - (p.T - p.X);
  const ingoing = (p: DiagramPoint) => c.T + c.X - (p.T + p.X);
  const strips = protocol.strips
    .map((s) => ({ kind: s.kind, polygon: clipToHalfPlane(s.polygon, s.kind === "far-field" || horizonGoesOutward(scene) ? outgoing : ingoing) }))
    .filter((s) => s.polygon.length >= 3);
  return {
    ...protocol,
    branches: before,
    marks: protocol.marks.filter((m) => m.T <= c.T + 1e-12),
    slices: protocol.slices.filter((slice) => slice.tauSeconds <= cursor.tauSeconds),
    strips,
  };
}
