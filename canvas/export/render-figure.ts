/**
 * One way from a drawing to a file, for the browser's Export menu and the figure command alike: SVG (labels as
 * text with the fonts embedded, or as outlines), PNG (the outlined SVG rasterised at a pixel ratio) and PDF (the
 * outlined SVG drawn by PDFKit). Only the rasteriser differs between the two: the browser's canvas, or resvg on
 * the command line; both draw the same outlines, so no font lookup can change a label.
 */
import { diagramSvg, type SvgText } from "./diagram-svg";
import type { FigureFontBytes } from "./figure-fonts";
import { figurePdf } from "./figure-pdf";
import type { ExportDrawing, MeasureText } from "./standalone-figure";
import { textWidth, type OutlineFonts } from "./text-paths";

export type FigureFileRequest =
  | { format: "svg"; lettering: "embedded" | "outlines" }
  | { format: "png"; pixelRatio: number }
  | { format: "pdf" };

export type FigureFileFormat = FigureFileRequest["format"];

export interface FigureToolkit {
  fontBytes: FigureFontBytes;
  outlines: OutlineFonts;
  /** An SVG (labels as outlines) as PNG bytes, `pixelRatio` times its size. */
  rasterise(svg: string, size: { width: number; height: number }, pixelRatio: number): Promise<Uint8Array>;
}

export interface FigureFile {
  bytes: Uint8Array;
  mediaType: "image/svg+xml" | "image/png" | "application/pdf";
}

/** Text widths measured with the figure fonts (for wrapping the caption and laying out the legend). */
export function measureWith(toolkit: Pick<FigureToolkit, "outlines">): MeasureText {
  return (text, fontSize) => textWidth(text, fontSize, toolkit.outlines);
}

export async function renderFigureFile(drawing: ExportDrawing, text: SvgText, request: FigureFileRequest, toolkit: FigureToolkit): Promise<FigureFile> {
  const outlined = () => diagramSvg(drawing, text, { kind: "outlines", fonts: toolkit.outlines });
  switch (request.format) {
    case "svg": {
      const svg = request.lettering === "embedded" ? diagramSvg(drawing, text, { kind: "embedded", fonts: toolkit.fontBytes }) : outlined();
      return { bytes: new TextEncoder().encode(svg), mediaType: "image/svg+xml" };
    }
    case "png":
      return { bytes: await toolkit.rasterise(outlined(), drawing, request.pixelRatio), mediaType: "image/png" };
    case "pdf":
      return { bytes: await figurePdf(outlined(), drawing, text.title), mediaType: "application/pdf" };
  }
}
