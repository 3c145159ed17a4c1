import "server-only";
/**
 * Whether an SVG may be kept: parsed as XML (as a browser opens an SVG file) by jsdom and passed through DOMPurify
 * 3 with its SVG profiles; when DOMPurify takes out anything that can run script or navigate — <script>,
 * <foreignObject> (HTML inside, e.g. an iframe), <animate>/<set> (they can rewrite an href to javascript:), event
 * attributes (on…=), or a link whose decoded value is javascript: (so "jav&#x61;script:" is caught after the
 * parser decodes it) — the file is refused with what was found. Harmless things DOMPurify also drops (an editor's
 * metadata elements) do not refuse a file; the bytes kept are the file as sent. Attachments are served as
 * downloads with a sandboxing policy besides (lib/storage.ts), so this is the second line, not the only one.
 */
import createDOMPurify from "dompurify";
import { JSDOM } from "jsdom";

const SCRIPT_CAPABLE_ELEMENTS = new Set(["script", "foreignobject", "iframe", "embed", "object", "animate", "set", "handler", "listener"]);
const LINK_ATTRIBUTES = new Set(["href", "xlink:href", "src", "action", "formaction", "from", "to", "values", "by", "attributename"]);

let purifier: ReturnType<typeof createDOMPurify> | null = null;
const purify = () => (purifier ??= createDOMPurify(new JSDOM("").window as unknown as Window & typeof globalThis));

/** The XML prolog (declaration, comments, doctype, processing instructions) before the root element. */
function withoutProlog(text: string): string {
  let rest = text.replace(/^\uFEFF/, "").trimStart();
  for (;;) {
    const end = rest.startsWith("<?") ? rest.indexOf("?>") + 2 : rest.startsWith("<!--") ? rest.indexOf("-->") + 3 : rest.startsWith("<!") ? rest.indexOf(">") + 1 : 0;
    if (end <= 0) return rest;
    rest = rest.slice(end).trimStart();
  }
}

export type SvgVerdict = { ok: true } | { ok: false; reason: string };

/** Whether the SVG text may be kept, and why not. */
export function svgVerdict(text: string): SvgVerdict {
  const dompurify = purify();
  const clean = String(
    dompurify.sanitize(withoutProlog(text), {
      USE_PROFILES: { svg: true, svgFilters: true },
      PARSER_MEDIA_TYPE: "application/xhtml+xml",
      ADD_TAGS: ["use"],
    }),
  );
  if (!/<(?:[\w-]+:)?svg[\s>/]/.test(clean)) return { ok: false, reason: "the SVG could not be read as well-formed XML with an <svg> root" };
  const found = new Set<string>();
  for (const removed of dompurify.removed as { element?: Element; attribute?: Attr | null; from?: Element }[]) {
    if (removed.element) {
      const name = removed.element.nodeName.toLowerCase().replace(/^[\w-]+:/, "");
      if (SCRIPT_CAPABLE_ELEMENTS.has(name)) found.add(`a <${removed.element.nodeName}> element`);
    } else if (removed.attribute) {
      const name = removed.attribute.name.toLowerCase();
      if (name.startsWith("on")) found.add(`an event attribute (${removed.attribute.name}=)`);
      else if (LINK_ATTRIBUTES.has(name)) found.add(`an unsafe ${removed.attribute.name}= value`);
    }
  }
  if (found.size === 0) return { ok: true };
  return { ok: false, reason: `the SVG contains ${[...found].join(", ")}, which can run script; Branchline does not keep such SVGs (export the figure without scripts or animations)` };
}
