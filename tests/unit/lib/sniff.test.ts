/**
 * File kinds from their bytes: the PDF header "%PDF-" (ISO 32000-1:2008, §7.5.2), the PNG signature
 * 89 50 4E 47 0D 0A 1A 0A (PNG specification, W3C 2003, §5.2), JSON as RFC 8259 text, SVG as XML with an <svg> root.
 */
import { describe, expect, it } from "vitest";
import { classifyAttachment, sniffContent } from "@/lib/sniff";

const text = (s: string) => new TextEncoder().encode(s);
const PNG_SIGNATURE = Uint8Array.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 13]);

describe("content sniffing", () => {
  it("knows a PDF and a PNG by their first bytes, whatever the name", () => {
    expect(sniffContent(text("%PDF-1.7\n"))).toMatchObject({ ok: true, kind: "pdf", mediaType: "application/pdf" });
    expect(sniffContent(PNG_SIGNATURE)).toMatchObject({ ok: true, kind: "png", mediaType: "image/png" });
    expect(classifyAttachment("notes.pdf", PNG_SIGNATURE)).toEqual({ ok: false, reason: "'notes.pdf' is named as a PDF but its content is a PNG image" });
  });

  it("takes an SVG after a prolog, and refuses scripts, event attributes and other XML", () => {
    const svg = '<?xml version="1.0"?>\n<!DOCTYPE svg>\n<!-- figure 3 -->\n<svg xmlns="http://www.w3.org/2000/svg"/>';
    expect(classifyAttachment("fig.svg", text(svg))).toMatchObject({ ok: true, kind: "svg" });
    expect(sniffContent(text('<svg><script href="x.js"/></svg>'))).toMatchObject({ ok: false, reason: expect.stringContaining("<script>") });
    expect(sniffContent(text('<svg><rect onclick="go()"/></svg>'))).toMatchObject({ ok: false, reason: expect.stringContaining("event attribute") });
    expect(sniffContent(text("<html></html>"))).toEqual({ ok: false, reason: "the content is XML with a <html> root, not an SVG image" });
  });

  it("tells JSON from CSV by parsing, and lets a .csv hold bracketed text", () => {
    expect(classifyAttachment("fit.json", text('{"a": 1}'))).toMatchObject({ ok: true, kind: "json" });
    expect(classifyAttachment("fit.json", text("a,b\n1,2"))).toEqual({ ok: false, reason: "'fit.json' is named as JSON but its content is not valid JSON" });
    expect(classifyAttachment("run.csv", text("[1]"))).toMatchObject({ ok: true, kind: "csv", mediaType: "text/csv" });
  });

  it("refuses empty files, binary text and endings it does not keep", () => {
    expect(sniffContent(new Uint8Array())).toEqual({ ok: false, reason: "the file is empty" });
    expect(classifyAttachment("run.csv", Uint8Array.from([0xc3, 0x28]))).toMatchObject({ ok: false, reason: expect.stringContaining("UTF-8") });
    expect(classifyAttachment("tool.exe", text("MZ"))).toMatchObject({ ok: false, reason: expect.stringContaining("not a kind of file") });
  });
});
