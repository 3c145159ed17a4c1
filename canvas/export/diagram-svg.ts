/**
 * A figure as an SVG file: a vector drawing written from the same shapes the stage draws (diagram-figure.ts, and
 * the sweep chart's sweep-figure.ts), so it stays crisp in a paper's PDF. Every line is a <path>, each part in a
 * named group (<g id="branch-a">, <g id="branch-b">, <g id="boundaries">, <g id="legend">, <g id="caption">, …).
 * Labels are <text> naming the figure fonts, with the fonts themselves embedded as data URLs (figure-fonts.ts), or
 * outlines when asked (text-paths.ts): a file that looks the same on any machine. Pure: text out, no DOM.
 */
import type { FigureFont, FigureShape } from "./diagram-figure";
import { FIGURE_SERIF_FAMILY, FIGURE_SYMBOLS_FAMILY, fontFaceCss, type FigureFontBytes } from "./figure-fonts";
import type { ExportDrawing } from "./standalone-figure";
import { textOutline, type OutlineFonts } from "./text-paths";

/** The fonts the labels ask for by name (shipped in fonts/, open licences), then common fallbacks. */
export const SVG_FONT_FAMILIES: Record<FigureFont, string> = {
  serif: `'${FIGURE_SERIF_FAMILY}', '${FIGURE_SYMBOLS_FAMILY}', 'Source Serif Pro', Georgia, 'Times New Roman', serif`,
  mono: `'IBM Plex Mono', '${FIGURE_SYMBOLS_FAMILY}', Menlo, Consolas, monospace`,
};

/**
 * How the labels are written: as text naming the fonts (a reader's own fonts draw them), as text with the fonts
 * embedded in the file, or as outlines (no text left; each outline keeps its words in aria-label).
 */
export type SvgLettering = { kind: "named" } | { kind: "embedded"; fonts: FigureFontBytes } | { kind: "outlines"; fonts: OutlineFonts };

export interface SvgText {
  /** Written as the file's <title> and <desc>. */
  title: string;
  description?: string;
}

export function escapeXml(text: string): string {
  return text.replace(/[&<>"']/g, (ch) => ({ "&": "&amp;", "<": "&lt;", ">": "&gt;", '"': "&quot;", "'": "&apos;" })[ch]!);
}

/** Two decimals are a hundredth of a pixel: finer than any print. */
const n = (v: number) => {
  const r = Math.round(v * 100) / 100;
  return Object.is(r, -0) ? "0" : String(r);
};

/**
 * A colour as SVG 1.1 readers take it: "#rrggbb" as is; "rgba(r, g, b, a)" as a hex colour and a separate opacity
 * (many PDF converters ignore rgba()).
 */
export function svgPaint(colour: string): { colour: string; opacity: number | null } {
  const rgba = /^rgba?\(\s*(\d+)\s*,\s*(\d+)\s*,\s*(\d+)\s*(?:,\s*([\d.]+)\s*)?\)$/.exec(colour);
  if (!rgba) return { colour, opacity: null };
  const hex = rgba.slice(1, 4).map((c) => Number(c).toString(16).padStart(2, "0")).join("");
  const alpha = rgba[4] === undefined ? 1 : Number(rgba[4]);
  return { colour: `#${hex}`, opacity: alpha === 1 ? null : alpha };
}

function paint(attribute: "fill" | "stroke", colour: string): string {
  const { colour: c, opacity } = svgPaint(colour);
  return `${attribute}="${escapeXml(c)}"${opacity === null ? "" : ` ${attribute}-opacity="${opacity}"`}`;
}

function pathData(points: number[], closed: boolean): string {
  const parts: string[] = [];
  for (let i = 0; i + 1 < points.length; i += 2) parts.push(`${i === 0 ? "M" : "L"}${n(points[i])} ${n(points[i + 1])}`);
  return parts.join(" ") + (closed ? " Z" : "");
}

/** Where a label's baseline sits: dy 0.35em below its anchor, as the <text> writes it. */
const BASELINE_EM = 0.35;

function outlineElement(shape: Extract<FigureShape, { kind: "text" }>, fonts: OutlineFonts): string {
  const { d, width } = textOutline(shape.text, shape.fontSize, fonts);
  const shift = shape.anchor === "start" ? 0 : shape.anchor === "middle" ? width / 2 : width;
  const turn = shape.rotation === 0 ? "" : `rotate(${shape.rotation} ${n(shape.x)} ${n(shape.y)}) `;
  const place = `${turn}translate(${n(shape.x - shift)} ${n(shape.y + BASELINE_EM * shape.fontSize)})`;
  return `<path d="${d}" transform="${place}" ${paint("fill", shape.fill)} aria-label="${escapeXml(shape.text)}"/>`;
}

function shapeElement(shape: FigureShape, lettering: SvgLettering): string {
  switch (shape.kind) {
    case "area":
      return `<path d="${pathData(shape.points, true)}" ${paint("fill", shape.fill)} stroke="none"/>`;
    case "line": {
      const dash = shape.dash.length > 0 ? ` stroke-dasharray="${shape.dash.join(" ")}"` : "";
      const join = shape.round ? ` stroke-linejoin="round" stroke-linecap="round"` : "";
      return `<path d="${pathData(shape.points, false)}" fill="none" ${paint("stroke", shape.stroke)} stroke-width="${shape.width}"${dash}${join}/>`;
    }
    case "dot": {
      const stroke = shape.stroke ? `${paint("stroke", shape.stroke)} stroke-width="${shape.width}"` : `stroke="none"`;
      return `<circle cx="${n(shape.x)}" cy="${n(shape.y)}" r="${shape.radius}" ${paint("fill", shape.fill)} ${stroke}/>`;
    }
    case "text": {
      if (lettering.kind === "outlines") return outlineElement(shape, lettering.fonts);
      // dy 0.35em puts the middle of the lowercase letters on the anchor, without dominant-baseline (which
      // several PDF converters ignore).
      const turn = shape.rotation === 0 ? "" : ` transform="rotate(${shape.rotation} ${n(shape.x)} ${n(shape.y)})"`;
      return `<text x="${n(shape.x)}" y="${n(shape.y)}" dy="0.35em" text-anchor="${shape.anchor}" font-family="${escapeXml(SVG_FONT_FAMILIES[shape.font])}" font-size="${n(shape.fontSize)}" ${paint("fill", shape.fill)}${turn}>${escapeXml(shape.text)}</text>`;
    }
  }
}

export function diagramSvg(figure: ExportDrawing, text: SvgText, lettering: SvgLettering = { kind: "named" }): string {
  const { width, height } = figure;
  const lines = [
    `<?xml version="1.0" encoding="UTF-8"?>`,
    `<svg xmlns="http://www.w3.org/2000/svg" version="1.1" width="${n(width)}" height="${n(height)}" viewBox="0 0 ${n(width)} ${n(height)}">`,
    `  <title>${escapeXml(text.title)}</title>`,
    ...(text.description ? [`  <desc>${escapeXml(text.description)}</desc>`] : []),
    ...(lettering.kind === "embedded" ? [`  <defs><style>`, fontFaceCss(lettering.fonts), `</style></defs>`] : []),
  ];
  for (const group of figure.groups) {
    if (group.shapes.length === 0) continue;
    lines.push(`  <g id="${group.id}">`);
    for (const shape of group.shapes) lines.push(`    ${shapeElement(shape, lettering)}`);
    lines.push(`  </g>`);
  }
  lines.push(`</svg>`, "");
  return lines.join("\n");
}
