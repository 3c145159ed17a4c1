/**
 * The Diagram as a PNG: the figure's shapes drawn by Konva on a stage that is never shown, then rasterised at
 * `pixelRatio` times the stage size. Konva redraws every shape at that ratio (it does not upscale the screen's
 * bitmap), so 2× and 4× are as crisp as the screen at that density. Browser only.
 */
import type { DiagramFigure } from "./diagram-figure";
import { konvaShape, type KonvaFonts } from "./konva-shapes";

export async function diagramPngDataUrl(figure: DiagramFigure, fonts: KonvaFonts, pixelRatio: number): Promise<string> {
  const { default: Konva } = await import("konva");
  const container = document.createElement("div");
  const stage = new Konva.Stage({ container, width: figure.width, height: figure.height });
  try {
    const layer = new Konva.Layer({ listening: false });
    for (const group of figure.groups) {
      const node = new Konva.Group({ name: group.id });
      for (const shape of group.shapes) {
        const { className, attrs } = konvaShape(shape, fonts);
        node.add(className === "Circle" ? new Konva.Circle(attrs) : className === "Text" ? new Konva.Text(attrs) : new Konva.Line(attrs));
      }
      layer.add(node);
    }
    stage.add(layer);
    layer.draw();
    return stage.toDataURL({ mimeType: "image/png", pixelRatio });
  } finally {
    stage.destroy();
  }
}
