/**
 * A figure that stands alone in a file: the drawing as it is on screen (same size, viewport and label layout), and
 * under it a band with the legend, the caption line and the notes on what is not to scale. The band grows the
 * figure downward; nothing of the drawing moves. Pure: shapes in, shapes out.
 */
import type { FigureShape } from "./diagram-figure";
import { CAPTION_SEPARATOR } from "./figure-caption";
import type { LegendEntry } from "./figure-legend";
import { estimatedTextWidth } from "./konva-shapes";
import type { FigurePalette } from "../theme";

/** A named group of shapes; an SVG writes each as <g id="…">. */
export interface NamedGroup {
  id: string;
  shapes: FigureShape[];
}

/** Any drawing the exports write: the Diagram's figure, the sweep chart, or either with its band. */
export interface ExportDrawing {
  width: number;
  height: number;
  groups: NamedGroup[];
}

export interface BandContent {
  /** null: no legend. */
  legend: LegendEntry[] | null;
  /** null: no caption. */
  caption: string | null;
  /** Small print under the caption (what is exaggerated or rescaled); drawn with the caption. */
  notes?: string[];
  palette: FigurePalette;
  /** Paint the band in the figure's ground (false: leave it transparent, as the drawing). */
  paper: boolean;
}

const MARGIN = 16;
const LEGEND_FONT = 12;
const LEGEND_ROW = 20;
const SWATCH = 26;
const CAPTION_FONT = 12;
const NOTE_FONT = 10.5;
const LINE_GAP = 1.35;
const ITEM_GAP = 18;

/** The width of a line of text in pixels: measured with the figure fonts where they are loaded, else estimated. */
export type MeasureText = (text: string, fontSize: number) => number;

/** Greedy line filling: parts joined by `separator`, a new line where the next part would pass `width`. */
export function wrapParts(parts: string[], separator: string, fontSize: number, width: number, measure: MeasureText = estimatedTextWidth): string[] {
  const lines: string[] = [];
  for (const part of parts) {
    const last = lines[lines.length - 1];
    const joined = last === undefined ? part : `${last}${separator}${part}`;
    if (last !== undefined && measure(joined, fontSize) <= width) lines[lines.length - 1] = joined;
    else lines.push(part);
  }
  return lines;
}

const text = (t: string, x: number, y: number, fontSize: number, fill: string): FigureShape => ({ kind: "text", text: t, x, y, anchor: "start", rotation: 0, fontSize, font: "serif", fill });

function legendShapes(entries: LegendEntry[], top: number, width: number, palette: FigurePalette, measure: MeasureText): { shapes: FigureShape[]; bottom: number } {
  const shapes: FigureShape[] = [];
  let x = MARGIN;
  let y = top + LEGEND_ROW / 2;
  for (const entry of entries) {
    const itemWidth = SWATCH + 6 + measure(entry.words, LEGEND_FONT);
    if (x > MARGIN && x + itemWidth > width - MARGIN) {
      x = MARGIN;
      y += LEGEND_ROW;
    }
    if (entry.kind === "line") {
      shapes.push({ kind: "line", points: [x, y, x + SWATCH, y], stroke: entry.stroke, width: entry.width, dash: entry.dash, round: false });
    } else {
      shapes.push({ kind: "area", points: [x + 3, y - 6, x + SWATCH - 3, y - 6, x + SWATCH - 3, y + 6, x + 3, y + 6], fill: entry.fill });
      shapes.push({ kind: "line", points: [x + 3, y - 6, x + SWATCH - 3, y - 6, x + SWATCH - 3, y + 6, x + 3, y + 6, x + 3, y - 6], stroke: palette.rule, width: 0.75, dash: [], round: false });
    }
    shapes.push(text(entry.words, x + SWATCH + 6, y, LEGEND_FONT, palette.inkSoft));
    x += itemWidth + ITEM_GAP;
  }
  return { shapes, bottom: y + LEGEND_ROW / 2 };
}

/** The drawing with its band under it. With neither legend nor caption, the drawing as it is. */
export function withBand(drawing: ExportDrawing, content: BandContent, measure: MeasureText = estimatedTextWidth): ExportDrawing {
  const { width } = drawing;
  const { palette } = content;
  const room = width - 2 * MARGIN;
  const legend: FigureShape[] = [];
  const caption: FigureShape[] = [];
  let y = drawing.height + MARGIN / 2;

  if (content.legend && content.legend.length > 0) {
    const laid = legendShapes(content.legend, y, width, palette, measure);
    legend.push(...laid.shapes);
    y = laid.bottom + 4;
  }
  if (content.caption) {
    const step = CAPTION_FONT * LINE_GAP;
    // Broken between parts; a part wider than the figure on its own (a narrow figure) between its words.
    const lines = wrapParts(content.caption.split(CAPTION_SEPARATOR), CAPTION_SEPARATOR, CAPTION_FONT, room, measure).flatMap((line) =>
      measure(line, CAPTION_FONT) > room ? wrapParts(line.split(" "), " ", CAPTION_FONT, room, measure) : [line],
    );
    for (const line of lines) {
      caption.push(text(line, MARGIN, y + step / 2, CAPTION_FONT, palette.ink));
      y += step;
    }
    const noteStep = NOTE_FONT * LINE_GAP;
    for (const line of (content.notes ?? []).flatMap((note) => wrapParts(note.split(" "), " ", NOTE_FONT, room, measure))) {
      caption.push(text(line, MARGIN, y + noteStep / 2, NOTE_FONT, palette.inkFaint));
      y += noteStep;
    }
  }
  if (legend.length === 0 && caption.length === 0) return drawing;

  const height = Math.ceil(y + MARGIN / 2);
  const band: FigureShape[] = content.paper ? [{ kind: "area", points: [0, drawing.height, width, drawing.height, width, height, 0, height], fill: palette.paper }] : [];
  return {
    width,
    height,
    groups: [
      ...drawing.groups,
      ...(band.length > 0 ? [{ id: "band", shapes: band }] : []),
      ...(legend.length > 0 ? [{ id: "legend", shapes: legend }] : []),
      ...(caption.length > 0 ? [{ id: "caption", shapes: caption }] : []),
    ],
  };
}
