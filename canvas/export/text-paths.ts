/**
 * Text as outlines: a label turned into one SVG path from the glyphs of the figure fonts (figure-fonts.ts), each
 * character taken from the first face that has it, runs of one face shaped together (kerning and ligatures by
 * fontkit's layout). Used for the "text as paths" SVG, and for the PNG and PDF, so that what a rasteriser or a PDF
 * writer draws does not depend on which fonts it can find. Pure: fonts in, path data out.
 */
import * as fontkit from "fontkit";
import type { Font } from "fontkit";
import type { FigureFontBytes } from "./figure-fonts";

export interface OutlineFonts {
  /** In fallback order (FIGURE_FONT_FACES). */
  faces: Font[];
}

export function openOutlineFonts(bytes: FigureFontBytes): OutlineFonts {
  // fontkit reads a Uint8Array; its types say Buffer, which is one.
  return { faces: bytes.map((b) => fontkit.create(b as Buffer) as Font) };
}

/** The face a character is drawn from: the first that has it, else the first (which draws its .notdef box). */
function faceIndexOf(fonts: OutlineFonts, codePoint: number): number {
  const index = fonts.faces.findIndex((f) => f.hasGlyphForCodePoint(codePoint));
  return index < 0 ? 0 : index;
}

interface Run {
  face: number;
  text: string;
}

function runsOf(text: string, fonts: OutlineFonts): Run[] {
  const runs: Run[] = [];
  for (const ch of text) {
    const face = faceIndexOf(fonts, ch.codePointAt(0)!);
    const last = runs[runs.length - 1];
    if (last && last.face === face) last.text += ch;
    else runs.push({ face, text: ch });
  }
  return runs;
}

/** Two decimals of a pixel. */
const round = (path: string) => path.replace(/-?\d+\.\d+(e-?\d+)?/g, (v) => String(Math.round(Number(v) * 100) / 100));

export interface TextOutline {
  /** Path data, the text starting at x = 0 on the baseline y = 0. */
  d: string;
  /** Advance width, pixels. */
  width: number;
}

/** The outline of one line of text at `fontSize` pixels. */
export function textOutline(text: string, fontSize: number, fonts: OutlineFonts): TextOutline {
  const parts: string[] = [];
  let x = 0;
  for (const run of runsOf(text, fonts)) {
    const font = fonts.faces[run.face];
    const scale = fontSize / font.unitsPerEm;
    const layout = font.layout(run.text);
    layout.glyphs.forEach((glyph, i) => {
      const position = layout.positions[i];
      const gx = x + position.xOffset * scale;
      const gy = -position.yOffset * scale;
      // Font units run upward; the figure's y runs downward.
      const d = glyph.path.transform(scale, 0, 0, -scale, gx, gy).toSVG();
      if (d) parts.push(d);
      x += position.xAdvance * scale;
    });
  }
  return { d: round(parts.join(" ")), width: x };
}

/** The advance width of a line of text, pixels. */
export function textWidth(text: string, fontSize: number, fonts: OutlineFonts): number {
  return textOutline(text, fontSize, fonts).width;
}
