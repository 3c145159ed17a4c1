/**
 * The figure command on every example scenario in each format: the SVG is well-formed with its named groups, the
 * PNG is a PNG of the asked width, the PDF is a PDF that draws with vector paths; bad input is refused with
 * "path: message" lines and exit code 2, as the compute command. The matrix runs the command's code in-process
 * (figureCommand, the whole command but for writing to stdout); a few runs go through the real process
 * (tsx scripts/figure.ts), which costs seconds each on this small machine.
 */
import { spawn } from "node:child_process";
import { readdirSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { descendants, parseXml } from "../canvas/export/xml-check";
import { pdfDrawing, pngSize } from "../canvas/export/file-checks";
import { figureCommand } from "@/scripts/figure-command";
import { InputRefusal } from "@/scripts/scenario-input";

const root = path.resolve(__dirname, "../../..");
const examplesDir = path.join(root, "examples");
const examples = readdirSync(examplesDir).filter((f) => f.endsWith(".json"));

interface Run {
  status: number | null;
  stdout: Buffer;
  stderr: string;
}

function run(args: string[], input?: string): Promise<Run> {
  return new Promise((resolve, reject) => {
    const child = spawn(process.execPath, ["--import", "tsx", path.join(root, "scripts/figure.ts"), ...args], { cwd: root });
    const out: Buffer[] = [];
    let err = "";
    child.stdout.on("data", (chunk: Buffer) => out.push(chunk));
    child.stderr.on("data", (chunk: Buffer) => (err += chunk.toString("utf8")));
    child.on("error", reject);
    child.on("close", (status) => resolve({ status, stdout: Buffer.concat(out), stderr: err }));
    child.stdin.end(input ?? "");
  });
}

/** The command in-process: its bytes, or the lines it refuses with. */
async function command(args: string[]): Promise<{ ok: true; bytes: Buffer } | { ok: false; lines: string[] }> {
  try {
    return { ok: true, bytes: Buffer.from(await figureCommand(args)) };
  } catch (error) {
    if (error instanceof InputRefusal) return { ok: false, lines: error.lines };
    throw error;
  }
}

async function bytesOf(args: string[]): Promise<Buffer> {
  const out = await command(args);
  if (!out.ok) throw new Error(out.lines.join("\n"));
  return out.bytes;
}

function checkSvg(svg: Buffer, name: string) {
  const tree = parseXml(svg.toString("utf8"));
  expect(tree.name, name).toBe("svg");
  const ids = descendants(tree).filter((el) => el.name === "g").map((el) => el.attributes.id);
  expect(ids, name).toEqual(expect.arrayContaining(NAMED_GROUPS));
  expect(svg.toString("utf8"), name).toMatch(/@font-face \{ font-family: 'Source Serif 4'.*src: url\(data:font\/woff2;base64,/);
}

function checkPdf(pdf: Buffer, name: string) {
  expect(pdf.subarray(0, 5).toString("latin1"), name).toBe("%PDF-");
  const drawing = pdfDrawing(pdf);
  expect(drawing.pathOperators, name).toBeGreaterThan(200);
  expect(drawing.paintOperators, name).toBeGreaterThan(20);
  expect(drawing.images, name).toBe(0);
  // Labels are outlines: the PDF needs no font.
  expect(drawing.textObjects, name).toBe(0);
}

const NAMED_GROUPS = ["branch-a", "branch-b", "lab-worldline", "boundaries", "labels", "legend", "caption"];

describe("npm run figure", () => {
  it.each(examples)("draws %s as SVG, PNG and PDF", async (file) => {
    const input = path.join(examplesDir, file);
    checkSvg(await bytesOf([input, "--format", "svg"]), file);
    expect(pngSize(await bytesOf([input, "--format", "png", "--width", "500", "--ratio", "2"])).width, file).toBe(1000);
    checkPdf(await bytesOf([input, "--format", "pdf", "--theme", "dark"]), file);
  }, 120_000);

  it("writes each format to standard output as a process too, and refuses bad input there with exit code 2", async () => {
    const [svg, png, pdf, bad] = await Promise.all([
      run([path.join(examplesDir, "schwarzschild.json")]),
      run([path.join(examplesDir, "rindler.json"), "--format", "png"]),
      run([path.join(examplesDir, "de-sitter.json"), "--format", "pdf"]),
      run(["-"], JSON.stringify({ schemaVersion: 1, background: { kind: "schwarzschild", massKg: -1 } })),
    ]);
    for (const r of [svg, png, pdf]) expect(r.status, r.stderr).toBe(0);
    checkSvg(svg.stdout, "schwarzschild.json");
    expect(pngSize(png.stdout).width).toBe(640);
    checkPdf(pdf.stdout, "de-sitter.json");
    expect(bad.status).toBe(2);
    expect(bad.stderr).toMatch(/^ {2}background\.massKg: .*must be positive$/m);
    expect(bad.stdout.length).toBe(0);
  }, 240_000);

  it("draws a sweep's chart, with its axes and curve in named groups, one unit per axis and ticks at the decades", async () => {
    const svg = await bytesOf([path.join(examplesDir, "schwarzschild.json"), "--what", "sweep", "--vary", "hold-time", "--from", "100 ms", "--to", "100 s", "--points", "9"]);
    const tree = parseXml(svg.toString("utf8"));
    const groups = descendants(tree).filter((el) => el.name === "g");
    expect(groups.map((g) => g.attributes.id)).toEqual(expect.arrayContaining(["axes", "curve", "now", "labels", "legend", "caption"]));
    const labels = descendants(groups.find((g) => g.attributes.id === "labels")!).map((t) => t.text);
    expect(labels).toEqual(expect.arrayContaining(["0.1", "1", "10", "100", "hold time (s)"]));
  }, 120_000);

  it("refuses bad options and documents with path: message lines", async () => {
    const options = await command([path.join(examplesDir, "minkowski.json"), "--format", "gif", "--theme", "sepia", "--width", "0"]);
    expect(options.ok).toBe(false);
    if (options.ok) return;
    expect(options.lines).toEqual(["the options cannot be used:", '  --format: must be svg, pdf, png; got "gif"', '  --theme: must be light, dark; got "sepia"', '  --width: must be a whole number from 1 to 8000; got "0"']);
    const document = await command([path.join(examplesDir, "minkowski.json"), "--what", "sweep", "--vary", "lab-distance"]);
    expect(document.ok).toBe(false);
    if (!document.ok) expect(document.lines.join("\n")).toMatch(/^ {2}--from: /m);
    const unknown = await command([path.join(examplesDir, "minkowski.json"), "--colour", "red"]);
    expect(unknown.ok).toBe(false);
    if (!unknown.ok) expect(unknown.lines[0]).toMatch(/--colour/);
    const missing = await command([path.join(examplesDir, "no-such-file.json")]);
    expect(missing.ok).toBe(false);
    if (!missing.ok) expect(missing.lines[0]).toMatch(/^cannot read .*no-such-file\.json/);
  }, 120_000);
});
