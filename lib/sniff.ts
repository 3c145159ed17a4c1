/**
 * What a file is, decided from its bytes rather than its name. Pure (no Node or browser APIs beyond TextDecoder), so
 * the upload form can ask the same question before sending.
 *
 * - PDF: starts with "%PDF-" (ISO 32000-1:2008, §7.5.2 File Header).
 * - PNG: the eight-byte signature 89 50 4E 47 0D 0A 1A 0A (PNG specification, W3C 2003, §5.2).
 * - SVG: UTF-8 XML text whose root element is <svg>, with no <script> element, no on…= event attribute and no
 *   javascript: link (an SVG is served as a download, but a store might still serve it inline).
 * - JSON: UTF-8 text that JSON.parse reads (RFC 8259).
 * - CSV: any other UTF-8 text without NUL bytes (RFC 4180 sets no signature).
 */
import { ATTACHMENT_EXTENSIONS } from "../contracts/requests";

export type AttachmentKind = "pdf" | "png" | "svg" | "json" | "csv";

export const MEDIA_TYPES: Record<AttachmentKind, string> = {
  pdf: "application/pdf",
  png: "image/png",
  svg: "image/svg+xml",
  json: "application/json",
  csv: "text/csv",
};

/** The kind each file name ending claims. */
const EXTENSIONS: Record<string, AttachmentKind> = { pdf: "pdf", png: "png", svg: "svg", json: "json", csv: "csv" };


export type Sniffed = { ok: true; kind: AttachmentKind; mediaType: string } | { ok: false; reason: string };

const PNG_SIGNATURE = [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a];

const startsWith = (bytes: Uint8Array, prefix: number[]) => prefix.every((b, i) => bytes[i] === b);

function utf8Text(bytes: Uint8Array): string | null {
  if (bytes.includes(0)) return null;
  try {
    return new TextDecoder("utf-8", { fatal: true }).decode(bytes).replace(/^\uFEFF/, "");
  } catch {
    return null;
  }
}

/** Strips the XML prolog (declaration, comments, doctype, processing instructions) and answers the root element's name. */
function xmlRootName(text: string): string | null {
  let rest = text.trimStart();
  for (;;) {
    if (rest.startsWith("<?")) rest = rest.slice(rest.indexOf("?>") + 2).trimStart();
    else if (rest.startsWith("<!--")) rest = rest.slice(rest.indexOf("-->") + 3).trimStart();
    else if (rest.startsWith("<!")) rest = rest.slice(rest.indexOf(">") + 1).trimStart();
    else break;
    if (rest === "") return null;
  }
  const match = /^<([A-Za-z_][\w:.-]*)/.exec(rest);
  return match ? match[1] : null;
}

function svgProblem(text: string): string | null {
  if (/<(?:[\w-]+:)?script[\s>/]/i.test(text)) return "the SVG contains a <script> element, which Branchline does not keep";
  if (/\son[a-z]+\s*=/i.test(text)) return "the SVG contains an event attribute (on…=), which Branchline does not keep";
  if (/(?:href|xlink:href)\s*=\s*["']\s*javascript:/i.test(text)) return "the SVG contains a javascript: link, which Branchline does not keep";
  return null;
}

/** What the bytes are, whatever the name says. */
export function sniffContent(bytes: Uint8Array): Sniffed {
  if (bytes.length === 0) return { ok: false, reason: "the file is empty" };
  if (startsWith(bytes, [0x25, 0x50, 0x44, 0x46, 0x2d])) return { ok: true, kind: "pdf", mediaType: MEDIA_TYPES.pdf };
  if (startsWith(bytes, PNG_SIGNATURE)) return { ok: true, kind: "png", mediaType: MEDIA_TYPES.png };
  const text = utf8Text(bytes);
  if (text === null) return { ok: false, reason: "the content is neither a PDF, a PNG nor UTF-8 text (SVG, JSON or CSV)" };
  const root = xmlRootName(text);
  if (root !== null && text.trimStart().startsWith("<")) {
    if (root.toLowerCase() !== "svg" && !root.toLowerCase().endsWith(":svg")) return { ok: false, reason: `the content is XML with a <${root}> root, not an SVG image` };
    const problem = svgProblem(text);
    return problem ? { ok: false, reason: problem } : { ok: true, kind: "svg", mediaType: MEDIA_TYPES.svg };
  }
  const trimmed = text.trim();
  if (trimmed.startsWith("{") || trimmed.startsWith("[")) {
    try {
      JSON.parse(trimmed);
      return { ok: true, kind: "json", mediaType: MEDIA_TYPES.json };
    } catch {
      // Not JSON: a CSV may start with a bracket too; the name decides below.
    }
  }
  return { ok: true, kind: "csv", mediaType: MEDIA_TYPES.csv };
}

/** The kind a file name claims by its ending, or null for an ending Branchline does not keep. */
export function kindFromName(fileName: string): AttachmentKind | null {
  const dot = fileName.lastIndexOf(".");
  return dot < 0 ? null : (EXTENSIONS[fileName.slice(dot + 1).toLowerCase()] ?? null);
}

const LABELS: Record<AttachmentKind, string> = { pdf: "a PDF", png: "a PNG image", svg: "an SVG image", json: "JSON", csv: "CSV text" };

/**
 * Decides the file's kind from its content and checks that the name agrees: a ".json" that does not parse, or a
 * ".png" that is really a PDF, is refused with the reason.
 */
export function classifyAttachment(fileName: string, bytes: Uint8Array): Sniffed {
  const claimed = kindFromName(fileName);
  if (claimed === null) return { ok: false, reason: `'${fileName}' is not a kind of file Branchline keeps: use ${ATTACHMENT_EXTENSIONS.join(", ")}` };
  const sniffed = sniffContent(bytes);
  if (!sniffed.ok) return sniffed;
  if (sniffed.kind === claimed) return sniffed;
  // JSON text is also valid CSV-ish text; only a name ending .csv may keep it as CSV.
  if (claimed === "csv" && sniffed.kind === "json") return { ok: true, kind: "csv", mediaType: MEDIA_TYPES.csv };
  if (claimed === "json" && sniffed.kind === "csv") return { ok: false, reason: `'${fileName}' is named as JSON but its content is not valid JSON` };
  return { ok: false, reason: `'${fileName}' is named as ${LABELS[claimed]} but its content is ${LABELS[sniffed.kind]}` };
}
