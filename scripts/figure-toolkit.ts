/**
 * The figure command's toolkit (canvas/export/render-figure.ts): the shipped fonts read from fonts/, and PNG drawn
 * by resvg from the SVG with its labels as outlines (no system font is loaded or needed).
 */
import { readFileSync } from "node:fs";
import path from "node:path";
import { Resvg } from "@resvg/resvg-js";
import { FIGURE_FONT_FACES } from "../canvas/export/figure-fonts";
import type { FigureToolkit } from "../canvas/export/render-figure";
import { openOutlineFonts } from "../canvas/export/text-paths";

const FONTS_DIR = path.resolve(__dirname, "../fonts");

export function nodeFigureToolkit(): FigureToolkit {
  const fontBytes = FIGURE_FONT_FACES.map((face) => new Uint8Array(readFileSync(path.join(FONTS_DIR, face.file))));
  return {
    fontBytes,
    outlines: openOutlineFonts(fontBytes),
    async rasterise(svg, _size, pixelRatio) {
      const png = new Resvg(svg, { fitTo: { mode: "zoom", value: pixelRatio }, font: { loadSystemFonts: false } }).render().asPng();
      return new Uint8Array(png);
    },
  };
}
