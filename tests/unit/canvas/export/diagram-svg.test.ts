import { describe, expect, it } from "vitest";
import { diagramFigure } from "@/canvas/export/diagram-figure";
import { diagramSvg, escapeXml, svgPaint } from "@/canvas/export/diagram-svg";
import { exportFigure } from "@/canvas/export/export-figure";
import { withSegmentDuration } from "@/canvas/kernels/document-edits";
import { buildDiagramScene, createSceneBuilder, type DiagramScene } from "@/canvas/kernels/diagram/scene";
import { FIGURE_PALETTES } from "@/canvas/theme";
import { defaultScenarioDocument, type ScenarioDocument } from "@/physics/scenario/schema";
import { schwarzschildDocument } from "../harness";
import { descendants, parseXml, type XmlElement } from "./xml-check";

const base = defaultScenarioDocument();
const documents: Record<string, { document: ScenarioDocument; labels: string[] }> = {
  Minkowski: { document: base, labels: ["ℐ⁺", "ℐ⁻", "i⁰", "i⁺", "i⁻"] },
  Schwarzschild: { document: schwarzschildDocument(), labels: ["H⁺", "ℐ⁺"] },
};

function sceneOf(document: ScenarioDocument): DiagramScene {
  const outcome = buildDiagramScene(document);
  if (!outcome.ok) throw new Error(outcome.issue.message);
  return outcome.scene;
}

const group = (svg: XmlElement, id: string) => descendants(svg).find((e) => e.name === "g" && e.attributes.id === id);

describe.each(Object.entries(documents))("the SVG of the %s diagram", (_name, { document, labels }) => {
  const scene = sceneOf(document);
  const size = { width: 520, height: 480 };
  const svg = diagramSvg(exportFigure(scene, size, "light", "solid"), { title: "Slow <recombination> & co", description: scene.notes.join(" ") });
  const root = parseXml(svg);

  it("is well-formed XML with an svg root in the SVG namespace, sized like the stage", () => {
    expect(root.name).toBe("svg");
    expect(root.attributes.xmlns).toBe("http://www.w3.org/2000/svg");
    expect(root.attributes.viewBox).toBe("0 0 520 480");
  });

  it("names the two branches in their own groups, each one stroked path in the branch colours, B dashed", () => {
    const a = group(root, "branch-a")!.children;
    const b = group(root, "branch-b")!.children;
    expect(a).toHaveLength(1);
    expect(b).toHaveLength(1);
    expect(a[0].name).toBe("path");
    expect(a[0].attributes.stroke).toBe(FIGURE_PALETTES.light.branchA);
    expect(a[0].attributes["stroke-dasharray"]).toBeUndefined();
    expect(b[0].attributes.stroke).toBe(FIGURE_PALETTES.light.branchB);
    expect(b[0].attributes["stroke-dasharray"]).toBe("7 4");
    // One point per branch sample of the scene.
    expect(a[0].attributes.d.match(/[ML]/g)).toHaveLength(scene.protocol!.branches.length);
  });

  it("writes the boundary labels as text in the figure's serif, by name", () => {
    const texts = descendants(group(root, "labels")!).filter((e) => e.name === "text");
    for (const label of labels) expect(texts.map((t) => t.text)).toContain(label);
    for (const t of texts) expect(t.attributes["font-family"]).toMatch(/^'Source Serif 4'/);
  });

  it("draws every line as a path, with no raster image and no rgba() colour", () => {
    const elements = descendants(root);
    expect(elements.some((e) => e.name === "image")).toBe(false);
    expect(elements.filter((e) => e.name === "path").length).toBeGreaterThan(10);
    expect(svg).not.toMatch(/rgba\(/);
  });

  it("escapes the title", () => {
    expect(descendants(root).find((e) => e.name === "title")?.text).toBe("Slow <recombination> & co");
  });

  it("leaves the ground out when asked for a transparent figure, and paints it white for a light solid one", () => {
    const transparent = parseXml(diagramSvg(exportFigure(scene, size, "light", "transparent"), { title: "t" }));
    expect(group(transparent, "background")).toBeUndefined();
    expect(group(root, "background")!.children[0].attributes.fill).toBe("#ffffff");
  });
});

describe("the figure shapes", () => {
  it("are the same for the stage and the export at the same size, so an exported figure is the one on screen", () => {
    const scene = sceneOf(base);
    const onScreen = diagramFigure(scene, { width: 500, height: 500 }, FIGURE_PALETTES.dark);
    const exported = exportFigure(scene, { width: 500, height: 500 }, "dark", "solid");
    expect(exported.viewport).toEqual(onScreen.viewport);
    expect(exported.groups.find((g) => g.id === "branch-a")).toEqual(onScreen.groups.find((g) => g.id === "branch-a"));
  });

  it("grow the boundary labels with the label scale, and the grid's by half as much", () => {
    const scene = sceneOf(base);
    const sizes = (scale: number) =>
      new Map(
        diagramFigure(scene, { width: 1400, height: 1400 }, FIGURE_PALETTES.light, { labelScale: scale })
          .groups.find((g) => g.id === "labels")!
          .shapes.flatMap((s) => (s.kind === "text" ? [[s.text, s.fontSize] as const] : [])),
      );
    const [normal, large] = [sizes(1), sizes(1.5)];
    expect(large.get("ℐ⁺")).toBeCloseTo(normal.get("ℐ⁺")! * 1.5, 9);
    const grid = scene.grid.map((g) => g.label).find((label) => normal.has(label) && large.has(label))!;
    expect(large.get(grid)).toBeCloseTo(normal.get(grid)! * 1.25, 9);
  });
});

describe("the figure during a drag", () => {
  const size = { width: 520, height: 480 };
  const ids = (groups: { id: string }[]) => groups.map((g) => g.id);

  it("hands back the very same backdrop groups when only the protocol changed, and new branches", () => {
    const build = createSceneBuilder();
    const start = schwarzschildDocument();
    const dragged = withSegmentDuration(start, "recombination", 2 * (start.protocol.kind === "segments" ? start.protocol.recombination.durationSeconds : 1));
    const [before, after] = [build(start), build(dragged)].map((o) => (o.ok ? diagramFigure(o.scene, size, FIGURE_PALETTES.light) : null));
    expect(ids(after!.groups)).toEqual(ids(before!.groups));
    for (const id of ["background", "regions", "grid", "boundaries", "lab-worldline", "labels"]) {
      expect(after!.groups.find((g) => g.id === id), id).toBe(before!.groups.find((g) => g.id === id));
    }
    expect(after!.groups.find((g) => g.id === "branch-a")).not.toEqual(before!.groups.find((g) => g.id === "branch-a"));
  });

  it("lays the backdrop out afresh for another background, size or palette (nothing stale is kept)", () => {
    const schwarzschild = sceneOf(schwarzschildDocument());
    const minkowski = sceneOf(base);
    // The Minkowski figure built right after a Schwarzschild one equals one built after a figure of another look.
    diagramFigure(schwarzschild, size, FIGURE_PALETTES.light);
    const afterOther = diagramFigure(minkowski, size, FIGURE_PALETTES.light);
    diagramFigure(minkowski, { width: 300, height: 300 }, FIGURE_PALETTES.dark);
    const afresh = diagramFigure(minkowski, size, FIGURE_PALETTES.light);
    expect(afterOther).toEqual(afresh);
    expect(diagramFigure(minkowski, { width: 300, height: 300 }, FIGURE_PALETTES.light).viewport).not.toEqual(afresh.viewport);
    expect(diagramFigure(minkowski, size, FIGURE_PALETTES.dark).groups[0]).not.toEqual(afresh.groups[0]);
    const labelSizes = (figure: ReturnType<typeof diagramFigure>) => figure.groups.find((g) => g.id === "labels")!.shapes.map((l) => (l.kind === "text" ? l.fontSize : 0));
    expect(labelSizes(diagramFigure(minkowski, size, FIGURE_PALETTES.light, { labelScale: 1.5 }))).not.toEqual(labelSizes(afresh));
    expect(diagramFigure(minkowski, size, FIGURE_PALETTES.light, { paperBackground: false }).groups[0].shapes).toEqual([]);
    expect(diagramFigure(minkowski, size, FIGURE_PALETTES.light).groups[0].shapes).toHaveLength(1);
  });
});

describe("SVG paint and text", () => {
  it("splits rgba() into a hex colour and an opacity, since many PDF converters ignore rgba()", () => {
    expect(svgPaint("rgba(230, 159, 0, 0.16)")).toEqual({ colour: "#e69f00", opacity: 0.16 });
    expect(svgPaint("#1c2024")).toEqual({ colour: "#1c2024", opacity: null });
  });

  it("escapes the five XML special characters", () => {
    expect(escapeXml(`a<b>&"c'`)).toBe("a&lt;b&gt;&amp;&quot;c&apos;");
  });
});

describe("the XML check used above", () => {
  it("refuses what is not well-formed", () => {
    expect(() => parseXml("<a><b></a></b>")).toThrow();
    expect(() => parseXml('<a x="1" x="2"/>')).toThrow();
    expect(() => parseXml("<a>R&D</a>")).toThrow();
    expect(() => parseXml("<a/><b/>")).toThrow();
    expect(parseXml('<a x="&lt;"><b/>t</a>').attributes.x).toBe("<");
  });
});
