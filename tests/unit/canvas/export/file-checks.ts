/**
 * Checks on exported files for the tests: a PNG's size from its IHDR chunk (PNG specification, W3C 2003, §11.2.2),
 * and a PDF's page content, inflated from its Flate streams (PDF 1.7, ISO 32000-1, §7.3.8 and §8.5 for the path
 * operators m, l, c, re and the painting operators S, f; §9.4 for text objects BT … ET).
 */
import { inflateSync } from "node:zlib";

export const PNG_SIGNATURE = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);

export function pngSize(png: Uint8Array): { width: number; height: number } {
  const bytes = Buffer.from(png);
  if (!bytes.subarray(0, 8).equals(PNG_SIGNATURE)) throw new Error("not a PNG");
  if (bytes.subarray(12, 16).toString("ascii") !== "IHDR") throw new Error("no IHDR first");
  return { width: bytes.readUInt32BE(16), height: bytes.readUInt32BE(20) };
}

/** Every stream of a PDF, inflated where it is Flate-encoded. */
export function pdfStreams(pdf: Uint8Array): string[] {
  const bytes = Buffer.from(pdf);
  const text = bytes.toString("latin1");
  const streams: string[] = [];
  const pattern = /<<((?:(?!>>\s*stream)[\s\S])*)>>\s*stream\r?\n/g;
  for (let match = pattern.exec(text); match; match = pattern.exec(text)) {
    const start = match.index + match[0].length;
    const end = text.indexOf("endstream", start);
    const raw = bytes.subarray(start, end);
    streams.push(/\/FlateDecode/.test(match[1]) ? inflateSync(raw).toString("latin1") : raw.toString("latin1"));
  }
  return streams;
}

/** What a PDF draws: how many path construction and painting operators, text objects and images it holds. */
export function pdfDrawing(pdf: Uint8Array): { pathOperators: number; paintOperators: number; textObjects: number; images: number } {
  const content = pdfStreams(pdf).join("\n");
  const count = (re: RegExp) => (content.match(re) ?? []).length;
  return {
    pathOperators: count(/(?:^|\s)(?:m|l|c|re)(?=\s)/g),
    paintOperators: count(/(?:^|\s)(?:S|f|B|f\*|b)(?=\s)/g),
    textObjects: count(/(?:^|\s)BT(?=\s)/g),
    images: count(/\/Subtype\s*\/Image/g) + (Buffer.from(pdf).toString("latin1").match(/\/Subtype\s*\/Image/g) ?? []).length,
  };
}
