/**
 * Exported figures that stand alone: the caption line in SI with units, the legend in the figure's own colours, the
 * band under the drawing (which moves nothing of it), the fonts the files carry (and that they draw every character
 * the figures use), text as outlines, and the sweep chart's ticks.
 */
import { readFileSync, readdirSync } from "node:fs";
import path from "node:path";
import { describe, expect, it, vi } from "vitest";
import { diagramSvg } from "@/canvas/export/diagram-svg";
import { exportDiagramDrawing, exportFigure } from "@/canvas/export/export-figure";
import { figureCaption, figureCaptionParts } from "@/canvas/export/figure-caption";
import { FIGURE_FONT_FACES } from "@/canvas/export/figure-fonts";
import { diagramLegend } from "@/canvas/export/figure-legend";
import { withBand, type ExportDrawing } from "@/canvas/export/standalone-figure";
import { axisUnit, labelled, logTicks, tickLabel } from "@/canvas/export/sweep-figure";
import { openOutlineFonts, textOutline, textWidth } from "@/canvas/export/text-paths";
import { buildDiagramScene, type DiagramScene } from "@/canvas/kernels/diagram/scene";
import { DASHES, FIGURE_PALETTES } from "@/canvas/theme";
import { sweepDrawing } from "@/components/export/sweep-export";
import { parseScenarioDocument, type ScenarioDocument } from "@/physics/scenario/schema";
import { sweepScenario } from "@/physics/sweeps";
import { descendants, parseXml } from "./xml-check";

// Font shaping and figure layout take seconds on a small shared machine.
vi.setConfig({ testTimeout: 120_000 });

const root = path.resolve(__dirname, "../../../..");
const fontBytes = FIGURE_FONT_FACES.map((face) => new Uint8Array(readFileSync(path.join(root, "fonts", face.file))));
const fonts = openOutlineFonts(fontBytes);
const measure = (text: string, size: number) => textWidth(text, size, fonts);

const examples: Record<string, ScenarioDocument> = Object.fromEntries(
  readdirSync(path.join(root, "examples"))
    .filter((f) => f.endsWith(".json"))
    .map((f) => {
      const parsed = parseScenarioDocument(JSON.parse(readFileSync(path.join(root, "examples", f), "utf8")));
      if (!parsed.ok) throw new Error(f);
      return [f, parsed.document];
    }),
);

function sceneOf(document: ScenarioDocument): DiagramScene {
  const outcome = buildDiagramScene(document);
  if (!outcome.ok) throw new Error(outcome.issue.message);
  return outcome.scene;
}

const texts = (drawing: ExportDrawing, id?: string) =>
  drawing.groups.filter((g) => id === undefined || g.id === id).flatMap((g) => g.shapes.flatMap((s) => (s.kind === "text" ? [s] : [])));

describe("the caption line", () => {
  it("gives background, lab, source, separation and protocol in SI with units", () => {
    const parts = figureCaptionParts(examples["schwarzschild.json"]);
    expect(parts).toHaveLength(5);
    // 10 M☉ from the IAU 2015 nominal GM☉ = 1.3271244e20 m³ s⁻² and CODATA 2018 G = 6.67430e-11: M = 1.98841e31 kg.
    expect(parts[0]).toBe("Schwarzschild, M = 1.99 × 10³¹ kg (10.0 M☉), rₛ = 29.5 km");
    // rₛ = 2GM/c² = 2 × 1.3271244e21 / 299792458² = 29 532 m, so r/rₛ = 300 km / 29.532 km = 10.16.
    const rs = (2 * 1.3271244e21) / 299_792_458 ** 2;
    expect(parts[1]).toBe(`lab at r = 300 km (r/rₛ = ${Number((300_000 / rs).toPrecision(3))})`);
    expect(parts[2]).toMatch(/^source q = 16\.0 aC, m = 10\.0 pg/);
    expect(parts[3]).toBe("separation d = 1.00 µm, radial, one branch stays");
    expect(parts[4]).toBe("protocol: separation 10.0 ms (minimum-jerk), hold 10.0 s, recombination 20.0 ms (minimum-jerk)");
  });

  it("says every background in its own terms", () => {
    expect(figureCaption(examples["minkowski.json"])).toMatch(/^Minkowski · lab inertial · /);
    expect(figureCaption(examples["rindler.json"])).toMatch(/^Rindler wedge, a = .* m\/s² \(c²\/a = .* m\)/);
    expect(figureCaption(examples["de-sitter.json"])).toMatch(/^de Sitter static patch, H = .* s⁻¹ \(c\/H = .*\)/);
  });
});

describe("the legend", () => {
  it("draws branch A solid orange and branch B dashed blue in the figure's palette, light and dark", () => {
    for (const theme of ["light", "dark"] as const) {
      const palette = FIGURE_PALETTES[theme];
      const [a, b] = diagramLegend(palette, []);
      expect(a).toMatchObject({ kind: "line", stroke: palette.branchA, dash: DASHES.branchA });
      expect(b).toMatchObject({ kind: "line", stroke: palette.branchB, dash: DASHES.branchB });
    }
    expect(FIGURE_PALETTES.dark.branchB).not.toBe(FIGURE_PALETTES.light.branchB);
  });

  it("keys only the radiation the Diagram draws: no horizon entry in flat spacetime", () => {
    const minkowski = sceneOf(examples["minkowski.json"]);
    const drawing = exportDiagramDrawing(examples["minkowski.json"], minkowski, { width: 560, height: 480 }, { theme: "light", ground: "solid", legend: true, caption: true }, measure);
    const words = texts(drawing, "legend").map((t) => t.text);
    expect(words).not.toContain("taken by the horizon while apart");
    const schwarzschild = exportDiagramDrawing(examples["schwarzschild.json"], sceneOf(examples["schwarzschild.json"]), { width: 560, height: 480 }, { theme: "dark", ground: "solid", legend: true, caption: true }, measure);
    expect(texts(schwarzschild, "legend").map((t) => t.text)).toContain("taken by the horizon while apart");
    const lines = schwarzschild.groups.find((g) => g.id === "legend")!.shapes.filter((s) => s.kind === "line" && s.width > 1);
    expect(lines.map((l) => (l.kind === "line" ? l.stroke : ""))).toEqual([FIGURE_PALETTES.dark.branchA, FIGURE_PALETTES.dark.branchB]);
  });
});

describe("the band under an exported figure", () => {
  const document = examples["schwarzschild.json"];
  const scene = sceneOf(document);
  const size = { width: 520, height: 420 };

  it("grows the figure downward and moves nothing of the drawing", () => {
    const bare = exportFigure(scene, size, "light", "solid");
    const banded = exportDiagramDrawing(document, scene, size, { theme: "light", ground: "solid", legend: true, caption: true }, measure);
    expect(banded.width).toBe(size.width);
    expect(banded.height).toBeGreaterThan(size.height + 60);
    for (const group of bare.groups) expect(banded.groups.find((g) => g.id === group.id)).toEqual(group);
    for (const t of [...texts(banded, "legend"), ...texts(banded, "caption")]) expect(t.y).toBeGreaterThan(size.height);
  });

  it("keeps every line of the legend and the caption inside the figure's width, with no two legend items overlapping", () => {
    for (const width of [320, 520, 900]) {
      const drawing = exportDiagramDrawing(document, scene, { width, height: 400 }, { theme: "light", ground: "solid", legend: true, caption: true }, measure);
      const placed = [...texts(drawing, "legend"), ...texts(drawing, "caption")].map((t) => ({ text: t.text, left: t.x, right: t.x + measure(t.text, t.fontSize), y: t.y }));
      for (const p of placed) expect(p.right, `${width}: ${p.text}`).toBeLessThanOrEqual(width - 8);
      const legend = texts(drawing, "legend").map((t) => ({ left: t.x - 32, right: t.x + measure(t.text, t.fontSize), y: t.y }));
      for (let i = 0; i < legend.length; i++)
        for (let j = i + 1; j < legend.length; j++) {
          const [p, q] = [legend[i], legend[j]];
          if (p.y === q.y) expect(p.right <= q.left || q.right <= p.left).toBe(true);
        }
    }
  });

  it("is left out with neither legend nor caption, and not painted on a transparent ground", () => {
    const bare = exportFigure(scene, size, "light", "solid");
    expect(exportDiagramDrawing(document, scene, size, { theme: "light", ground: "solid", legend: false, caption: false })).toEqual(bare);
    const clear = withBand(exportFigure(scene, size, "light", "transparent"), { legend: diagramLegend(FIGURE_PALETTES.light, []), caption: "x", palette: FIGURE_PALETTES.light, paper: false });
    expect(clear.groups.find((g) => g.id === "band")).toBeUndefined();
  });
});

describe("the fonts a figure carries", () => {
  it("are the same bytes in fonts/ (the command line) and public/figure-fonts/ (the browser)", () => {
    for (const face of FIGURE_FONT_FACES) {
      expect(readFileSync(path.join(root, "public/figure-fonts", face.file)).equals(readFileSync(path.join(root, "fonts", face.file))), face.file).toBe(true);
    }
  });

  it("come with their licences, which allow embedding (SIL OFL 1.1; Bitstream Vera licence for DejaVu)", () => {
    expect(readFileSync(path.join(root, "fonts/LICENSE-source-serif-4.txt"), "utf8")).toMatch(/SIL Open Font License, Version 1\.1/);
    expect(readFileSync(path.join(root, "fonts/LICENSE-dejavu-sans.txt"), "utf8")).toMatch(/Permission is hereby granted, free of charge/);
  });

  it("draw every character of every example's figures and sweep chart, in light and dark", () => {
    const faces = fonts.faces;
    for (const [name, document] of Object.entries(examples)) {
      for (const theme of ["light", "dark"] as const) {
        const drawing = exportDiagramDrawing(document, sceneOf(document), { width: 640, height: 480 }, { theme, ground: "solid", legend: true, caption: true }, measure);
        for (const t of texts(drawing)) {
          for (const ch of t.text) expect(faces.some((f) => f.hasGlyphForCodePoint(ch.codePointAt(0)!)), `${name}: "${ch}" in "${t.text}"`).toBe(true);
        }
      }
    }
  });

  it("are embedded whole as @font-face data URLs, one per face, that decode to the shipped files", () => {
    const document = examples["schwarzschild.json"];
    const drawing = exportDiagramDrawing(document, sceneOf(document), { width: 560, height: 480 }, { theme: "light", ground: "solid", legend: true, caption: true }, measure);
    const svg = diagramSvg(drawing, { title: "t" }, { kind: "embedded", fonts: fontBytes });
    const urls = [...svg.matchAll(/url\(data:font\/woff2;base64,([A-Za-z0-9+/=]+)\)/g)].map((m) => Buffer.from(m[1], "base64"));
    expect(urls).toHaveLength(FIGURE_FONT_FACES.length);
    urls.forEach((bytes, i) => expect(bytes.equals(Buffer.from(fontBytes[i]))).toBe(true));
    const tree = parseXml(svg);
    expect(descendants(tree).filter((e) => e.name === "text").length).toBeGreaterThan(10);
  });

  it("turn into outlines on request: no text left, each outline keeping its words, wider words giving wider outlines", () => {
    const document = examples["schwarzschild.json"];
    const drawing = exportDiagramDrawing(document, sceneOf(document), { width: 560, height: 480 }, { theme: "dark", ground: "solid", legend: true, caption: true }, measure);
    const tree = parseXml(diagramSvg(drawing, { title: "t" }, { kind: "outlines", fonts }));
    const all = descendants(tree);
    expect(all.some((e) => e.name === "text")).toBe(false);
    const labelled = all.filter((e) => e.name === "path" && e.attributes["aria-label"]).map((e) => e.attributes["aria-label"]);
    expect(labelled).toEqual(expect.arrayContaining(["ℐ⁺", "H⁺", "branch A (solid)"]));
    expect(textOutline("MM", 14, fonts).width).toBeGreaterThan(textOutline("ii", 14, fonts).width);
    expect(textOutline("ℐ⁺", 14, fonts).d).toMatch(/^M/);
  });
});

describe("the sweep chart's axes", () => {
  it("ticks a log axis at its decades, with minor ticks between, and at 1, 2 and 5 where it spans less than a decade", () => {
    expect(logTicks(0.1, 100).major).toEqual([0.1, 1, 10, 100]);
    expect(logTicks(0.1, 100).minor).toContain(0.2);
    expect(logTicks(0.1, 100).minor).toContain(90);
    const short = logTicks(1.5, 8);
    expect(short.major).toEqual([2, 5]);
    expect(short.minor).toEqual([3, 4, 6, 7, 8]);
  });

  it("uses one unit per axis, chosen for the range, and prints powers of ten beyond 10⁴", () => {
    expect(axisUnit("time", 1e-4, 1)).toEqual({ symbol: "ms", perUnit: 1e-3 });
    expect(axisUnit("length", 3e4, 3e6)).toEqual({ symbol: "km", perUnit: 1e3 });
    expect(axisUnit("time", 10, 1e4)).toEqual({ symbol: "s", perUnit: 1 });
    expect(tickLabel(0.1)).toBe("0.1");
    expect(tickLabel(1e-6)).toBe("10⁻⁶");
    expect(tickLabel(2e5)).toBe("2 × 10⁵");
    // Twelve decades are too many labels: every second one is labelled, the even exponents.
    const decades = Array.from({ length: 12 }, (_, i) => 10 ** (i - 20));
    expect(labelled(decades).map((v) => Math.round(Math.log10(v)))).toEqual([-20, -18, -16, -14, -12, -10]);
  });

  it("draws the sweep's points inside the plot, in the figure palette, with the current value marked", () => {
    const document = examples["schwarzschild.json"];
    const sweep = sweepScenario(document, { parameter: "hold-time", fromValue: 0.1, toValue: 100, points: 7 });
    const drawing = sweepDrawing(document, sweep, { width: 600, height: 380 }, { theme: "dark", ground: "solid", legend: true, caption: true }, measure);
    const curve = drawing.groups.find((g) => g.id === "curve")!.shapes;
    expect(curve.filter((s) => s.kind === "dot")).toHaveLength(7);
    for (const s of curve) if (s.kind === "dot") expect(s.x >= 0 && s.x <= 600 && s.y >= 0 && s.y <= 380).toBe(true);
    expect(curve[0]).toMatchObject({ kind: "line", stroke: FIGURE_PALETTES.dark.branchB });
    expect(drawing.groups.find((g) => g.id === "now")).toBeDefined();
    expect(texts(drawing, "caption").map((t) => t.text).join(" ")).toMatch(/sweep of the hold time from 100 ms to 100 s, 7 points/);
  });
});
