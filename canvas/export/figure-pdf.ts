/**
 * A figure as a one-page vector PDF: the SVG with its labels as outlines (text-paths.ts), drawn by PDFKit through
 * svg-to-pdfkit. The page is the figure's size at 96 px to the inch (1 px = 0.75 pt). One code path for the browser
 * (PDFKit's browser build) and the command line (its Node build): no DOM, no fonts looked up anywhere, so the same
 * file comes out of both. Outlines, not text: the PDF needs no font at all and looks the same in every reader.
 */
import PDFDocument from "pdfkit";
import SVGtoPDF from "svg-to-pdfkit";

export const POINTS_PER_PIXEL = 0.75;

export function figurePdf(svgWithOutlines: string, size: { width: number; height: number }, title: string): Promise<Uint8Array> {
  const width = size.width * POINTS_PER_PIXEL;
  const height = size.height * POINTS_PER_PIXEL;
  // font: null — no standard font is loaded: the labels are outlines, and PDFKit's browser build ships no font data.
  const options = { size: [width, height], margin: 0, autoFirstPage: true, compress: true, font: null, info: { Title: title, Creator: "Branchline" } };
  const doc = new PDFDocument(options as unknown as PDFKit.PDFDocumentOptions);
  const chunks: Uint8Array[] = [];
  const done = new Promise<Uint8Array>((resolve, reject) => {
    doc.on("data", (chunk: Uint8Array) => chunks.push(chunk));
    doc.on("end", () => {
      const out = new Uint8Array(chunks.reduce((sum, c) => sum + c.length, 0));
      let at = 0;
      for (const c of chunks) {
        out.set(c, at);
        at += c.length;
      }
      resolve(out);
    });
    doc.on("error", reject);
  });
  SVGtoPDF(doc, svgWithOutlines, 0, 0, { width, height, preserveAspectRatio: "xMidYMid meet" });
  doc.end();
  return done;
}
