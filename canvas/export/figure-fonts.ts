/**
 * The fonts an exported figure carries: Source Serif 4 (SIL OFL 1.1, fonts/LICENSE-source-serif-4.txt) for every
 * label, in its Latin and Greek files, and a small subset of DejaVu Sans (Bitstream Vera licence and public domain,
 * fonts/LICENSE-dejavu-sans.txt) for what the serif files lack: ℐ, super- and subscripts (⁺ ⁻ ⁰ ₛ), ☉, ⟨ ⟩ and
 * mathematical operators. Both licences allow the fonts to be embedded in a document and redistributed with it.
 *
 * The files are the same bytes in fonts/ (read by the command line) and public/figure-fonts/ (fetched by the
 * browser); a unit test keeps the two copies equal. Pure: the caller hands in the bytes.
 *
 * The symbols subset was made with fontTools from @fontsource/dejavu-sans 5.3.0:
 *   pyftsubset dejavu-sans-latin-400-normal.woff2 --flavor=woff2 --layout-features='*' \
 *     --unicodes="U+2070-209F,U+2100-214F,U+2190-21FF,U+2200-22FF,U+2300-230F,U+27E8-27E9,U+2609"
 */

export interface FigureFontFace {
  /** The family the SVG asks for. */
  family: string;
  /** The file name, in fonts/ and public/figure-fonts/. */
  file: string;
  /** CSS unicode-range of the file (which characters a browser takes from it). */
  unicodeRange: string;
}

export const FIGURE_SERIF_FAMILY = "Source Serif 4";
export const FIGURE_SYMBOLS_FAMILY = "DejaVu Sans Figure Symbols";

/** In fallback order: a character is drawn from the first face that has it. */
export const FIGURE_FONT_FACES: readonly FigureFontFace[] = [
  {
    family: FIGURE_SERIF_FAMILY,
    file: "source-serif-4-latin-400-normal.woff2",
    unicodeRange: "U+0000-00FF, U+0131, U+0152-0153, U+02BB-02BC, U+02C6, U+02DA, U+02DC, U+0304, U+0308, U+0329, U+2000-206F, U+20AC, U+2122, U+2191, U+2193, U+2212, U+2215, U+FEFF, U+FFFD",
  },
  { family: FIGURE_SERIF_FAMILY, file: "source-serif-4-greek-400-normal.woff2", unicodeRange: "U+0370-0377, U+037A-037F, U+0384-038A, U+038C, U+038E-03A1, U+03A3-03FF" },
  { family: FIGURE_SYMBOLS_FAMILY, file: "dejavu-sans-figure-symbols.woff2", unicodeRange: "U+2070-209F, U+2100-214F, U+2190-21FF, U+2200-22FF, U+2300-230F, U+27E8-27E9, U+2609" },
];

/** The bytes of each face, in the order of FIGURE_FONT_FACES. */
export type FigureFontBytes = readonly Uint8Array[];

/** Where the browser fetches the faces from (public/figure-fonts/). */
export const FIGURE_FONTS_URL_PATH = "/figure-fonts";

/** Base64 without Buffer (the browser has none), in chunks so no call gets too many arguments. */
export function base64(bytes: Uint8Array): string {
  let binary = "";
  const chunk = 0x8000;
  for (let i = 0; i < bytes.length; i += chunk) binary += String.fromCharCode(...bytes.subarray(i, i + chunk));
  return btoa(binary);
}

/** @font-face rules carrying every face as a data URL, for an SVG's <style>. */
export function fontFaceCss(bytes: FigureFontBytes): string {
  return FIGURE_FONT_FACES.map(
    (face, i) =>
      `@font-face { font-family: '${face.family}'; font-style: normal; font-weight: 400; unicode-range: ${face.unicodeRange}; src: url(data:font/woff2;base64,${base64(bytes[i])}) format('woff2'); }`,
  ).join("\n");
}
