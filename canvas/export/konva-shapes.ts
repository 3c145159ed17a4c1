/**
 * A figure shape (diagram-figure.ts) as the Konva class and attributes that draw it: one mapping for the stage on
 * screen (react-konva) and the PNG export (plain Konva, off screen).
 */
import type { FigureFont, FigureShape } from "./diagram-figure";

export interface KonvaFonts {
  serif: string;
  mono: string;
}

export type KonvaShape =
  | { className: "Line"; attrs: Record<string, unknown> }
  | { className: "Circle"; attrs: Record<string, unknown> }
  | { className: "Text"; attrs: Record<string, unknown> };

/** Room beyond the estimated width of a label (Konva crops text wider than its box). */
const LABEL_SLACK_PX = 24;

export function estimatedTextWidth(text: string, fontSize: number): number {
  return [...text].length * fontSize * 0.56;
}

export function konvaShape(shape: FigureShape, fonts: KonvaFonts): KonvaShape {
  const font = (f: FigureFont) => fonts[f];
  switch (shape.kind) {
    case "area":
      return { className: "Line", attrs: { points: shape.points, closed: true, fill: shape.fill, listening: false } };
    case "line":
      return {
        className: "Line",
        attrs: { points: shape.points, stroke: shape.stroke, strokeWidth: shape.width, dash: shape.dash, lineJoin: shape.round ? "round" : "miter", lineCap: shape.round ? "round" : "butt", listening: false },
      };
    case "dot":
      return { className: "Circle", attrs: { x: shape.x, y: shape.y, radius: shape.radius, stroke: shape.stroke ?? undefined, strokeWidth: shape.width, fill: shape.fill, listening: false } };
    case "text": {
      const width = estimatedTextWidth(shape.text, shape.fontSize) + LABEL_SLACK_PX;
      const align = shape.anchor === "start" ? "left" : shape.anchor === "middle" ? "center" : "right";
      const offsetX = shape.anchor === "start" ? 0 : shape.anchor === "middle" ? width / 2 : width;
      return {
        className: "Text",
        attrs: {
          text: shape.text,
          x: shape.x,
          y: shape.y,
          width,
          offsetX,
          offsetY: shape.fontSize / 2,
          rotation: shape.rotation,
          align,
          fontSize: shape.fontSize,
          fontFamily: font(shape.font),
          fill: shape.fill,
          lineHeight: 1,
          wrap: "none",
          listening: false,
        },
      };
    }
  }
}
