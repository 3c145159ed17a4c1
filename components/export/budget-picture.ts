/**
 * The Budget table as a picture for a slide (PNG or SVG, through html-to-image): a copy of the table on screen, on
 * a light or dark ground, with the caption line under it, laid out off screen and drawn at 2× by default. The dark
 * picture swaps the interface's ink and paper colours for the dark figure palette's, as the dark figures do.
 * Browser only.
 */
import { FIGURE_PALETTES } from "@/canvas/theme";
import type { FigureTheme } from "@/canvas/export/export-figure";

export interface BudgetPictureOptions {
  theme: FigureTheme;
  kind: "png" | "svg";
  pixelRatio: number;
  /** null: no caption. */
  caption: string | null;
}

/** The interface's colours (tailwind.config.ts) and what they become in a dark picture. */
const DARK_SWAPS: [string, string][] = [
  ["#1c2024", FIGURE_PALETTES.dark.ink],
  ["#4a5058", FIGURE_PALETTES.dark.inkSoft],
  ["#666b73", FIGURE_PALETTES.dark.inkFaint],
  ["#d9d6cf", FIGURE_PALETTES.dark.rule],
  ["#b9b5ac", "#5b6168"],
  ["#fbfaf7", FIGURE_PALETTES.dark.paper],
];

const rgbOf = (hex: string) => `rgb(${parseInt(hex.slice(1, 3), 16)}, ${parseInt(hex.slice(3, 5), 16)}, ${parseInt(hex.slice(5, 7), 16)})`;

/** Colours as the browser computes them ("rgb(r, g, b)", or with an alpha), with ink and paper swapped. */
function darkened(colour: string): string {
  for (const [light, dark] of DARK_SWAPS) {
    const rgb = rgbOf(light);
    if (colour === rgb) return dark;
    const alpha = new RegExp(`^rgba\\(${rgb.slice(4, -1)}, ([\\d.]+)\\)$`).exec(colour);
    if (alpha) return `color-mix(in srgb, ${dark} ${Number(alpha[1]) * 100}%, transparent)`;
  }
  return colour;
}

const COLOUR_PROPERTIES = ["color", "borderTopColor", "borderRightColor", "borderBottomColor", "borderLeftColor", "textDecorationColor", "backgroundColor"] as const;

function darken(root: HTMLElement): void {
  for (const element of [root, ...root.querySelectorAll<HTMLElement>("*")]) {
    const style = getComputedStyle(element);
    for (const property of COLOUR_PROPERTIES) {
      const value = style[property];
      const swapped = darkened(value);
      if (swapped !== value) element.style[property] = swapped;
    }
  }
}

/** The picture as a data URL (image/png or image/svg+xml). */
export async function budgetPictureDataUrl(table: HTMLTableElement, options: BudgetPictureOptions): Promise<string> {
  const { toPng, toSvg } = await import("html-to-image");
  const ground = options.theme === "dark" ? FIGURE_PALETTES.dark.paper : "#ffffff";
  const frame = document.createElement("div");
  // Off screen but laid out (html-to-image measures what it draws).
  Object.assign(frame.style, { position: "fixed", left: "-10000px", top: "0", padding: "16px 20px", background: ground, width: `${Math.ceil(table.getBoundingClientRect().width) + 40}px` });
  const copy = table.cloneNode(true) as HTMLTableElement;
  frame.appendChild(copy);
  if (options.caption) {
    const caption = document.createElement("p");
    caption.textContent = options.caption;
    caption.className = "mt-3 text-xs text-ink-soft";
    frame.appendChild(caption);
  }
  document.body.appendChild(frame);
  try {
    if (options.theme === "dark") darken(frame);
    // The copy html-to-image draws is put back where a picture starts (the frame itself stays off screen).
    const drawn = { backgroundColor: ground, pixelRatio: options.pixelRatio, cacheBust: false, style: { position: "static", left: "0", top: "0" } };
    return options.kind === "png" ? await toPng(frame, drawn) : await toSvg(frame, drawn);
  } finally {
    frame.remove();
  }
}
