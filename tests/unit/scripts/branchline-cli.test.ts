/**
 * The `branchline` command line: every command's --help, the exit codes, compute and sweep computed here (checked
 * against the physics library on the same documents), and the launcher run as a real child process
 * (bin/branchline.mjs through tsx, a few seconds each on this small machine, so only twice).
 */
import { spawn } from "node:child_process";
import { readFileSync } from "node:fs";
import path from "node:path";
import Papa from "papaparse";
import { describe, expect, it } from "vitest";
import { computeScenario } from "@/physics";
import { parseScenarioDocument } from "@/physics/scenario/schema";
import { commands, main } from "@/scripts/cli/main";
import { EXIT } from "@/scripts/cli/failure";

const root = path.resolve(__dirname, "../../..");
const example = (name: string) => path.join(root, "examples", name);

async function run(argv: string[], env: Record<string, string | undefined> = {}) {
  let stdout = "";
  let stderr = "";
  const saved = Object.fromEntries(Object.keys(env).map((k) => [k, process.env[k]]));
  Object.assign(process.env, env);
  try {
    const code = await main(argv, { stdout: { write: (c: string | Uint8Array) => (stdout += typeof c === "string" ? c : Buffer.from(c).toString("latin1")) }, stderr: { write: (c: string) => (stderr += c) } });
    return { code, stdout, stderr };
  } finally {
    for (const [k, v] of Object.entries(saved)) {
      if (v === undefined) delete process.env[k];
      else process.env[k] = v;
    }
  }
}

/** The data rows of a CSV with "#" comment lines first. */
const csvRows = (text: string) => Papa.parse<string[]>(text.split("\r\n").filter((l) => !l.startsWith("#")).join("\r\n").trim()).data;

describe("branchline command line", () => {
  it("lists its commands and exit codes with --help, and answers 2 without a command or with an unknown one", async () => {
    const help = await run(["--help"]);
    expect(help.code).toBe(EXIT.ok);
    for (const name of ["compute", "sweep", "map", "figure", "pull", "push"]) expect(help.stdout).toContain(`  ${name} `);
    expect(help.stdout).toContain("exit codes:");
    expect(help.stdout).toContain("BRANCHLINE_TOKEN");
    expect((await run([])).code).toBe(EXIT.badInput);
    const unknown = await run(["launch"]);
    expect(unknown.code).toBe(EXIT.badInput);
    expect(unknown.stderr).toContain('unknown command "launch"');
  });

  it("gives every command its own --help", async () => {
    for (const name of Object.keys(commands)) {
      const res = await run([name, "--help"]);
      expect(res.code, name).toBe(EXIT.ok);
      expect(res.stdout, name).toMatch(new RegExp(`^usage: branchline ${name} `));
      expect(res.stdout, name).toContain("exit codes:");
    }
  });

  it("computes a document as the physics library does, and as a table and CSV with units", async () => {
    const document = JSON.parse(readFileSync(example("schwarzschild.json"), "utf8"));
    const res = await run(["compute", example("schwarzschild.json")]);
    expect(res.code).toBe(EXIT.ok);
    const parsed = parseScenarioDocument(document);
    if (!parsed.ok) throw new Error("example does not parse");
    expect(JSON.parse(res.stdout)).toEqual(JSON.parse(JSON.stringify(computeScenario(parsed.document))));
    const table = await run(["compute", example("schwarzschild.json"), "--format", "table"]);
    expect(table.stdout).toMatch(/^quantity\s+value\s+unit\s+source/);
    expect(table.stdout).toContain("Quanta into the horizon (electromagnetic)");
    const csv = await run(["compute", example("schwarzschild.json"), "--format", "csv"]);
    expect(csv.stdout).toContain("# background.massKg: ");
    expect(csvRows(csv.stdout)[0]).toEqual(["quantity", "value", "unit", "source"]);
  });

  it("refuses bad input with path: message lines and exit code 2", async () => {
    const format = await run(["compute", example("minkowski.json"), "--format", "xml"]);
    expect(format.code).toBe(EXIT.badInput);
    expect(format.stderr).toContain("--format: must be json, csv, table");
    const missing = await run(["compute", path.join(root, "examples", "no-such-file.json")]);
    expect(missing.code).toBe(EXIT.badInput);
    expect(missing.stderr).toMatch(/cannot read/);
    const option = await run(["sweep", example("minkowski.json"), "--bogus"]);
    expect(option.code).toBe(EXIT.badInput);
    const flat = await run(["sweep", example("minkowski.json"), "--vary", "lab-distance", "--from", "1 m", "--to", "2 m", "--points", "2"]);
    expect(flat.code).toBe(EXIT.badInput);
    expect(flat.stderr).toContain("background.kind:");
  });

  it("sweeps here, with quantities read with their units and points spaced evenly in the logarithm", async () => {
    const res = await run(["sweep", example("minkowski.json"), "--vary", "hold-time", "--from", "1 ms", "--to", "100 ms", "--points", "3", "--format", "csv"]);
    expect(res.code, res.stderr).toBe(EXIT.ok);
    const rows = csvRows(res.stdout);
    expect(rows[0][0]).toBe("hold-time [s]");
    expect(rows.slice(1).map((r) => Number(r[0]))).toEqual([expect.closeTo(1e-3, 15), expect.closeTo(1e-2, 14), expect.closeTo(1e-1, 13)]);
    const json = await run(["sweep", example("minkowski.json"), "--vary", "hold-time", "--from", "1 ms", "--to", "100 ms", "--points", "3"]);
    expect(JSON.parse(json.stdout).sweep.points).toHaveLength(3);
    const tooMany = await run(["sweep", example("minkowski.json"), "--points", "200", "--remote"]);
    expect(tooMany.code).toBe(EXIT.badInput);
    expect(tooMany.stderr).toContain("--points: must be a whole number from 1 to 100");
  });

  it("maps two parameters here: each point is the document with both values set by hand, computed directly", async () => {
    const args = ["map", example("minkowski.json"), "--x", "recombination-time", "--x-from", "1 ms", "--x-to", "100 ms", "--x-points", "3"];
    const axisY = ["--y", "hold-time", "--y-from", "10 ms", "--y-to", "30 ms", "--y-points", "2", "--y-scale", "linear"];
    const res = await run([...args, ...axisY]);
    expect(res.code, res.stderr).toBe(EXIT.ok);
    const grid = JSON.parse(res.stdout).map;
    // Log spacing on x (1, 10, 100 ms), linear on y (10, 30 ms): the definitions, not the program's own axis code.
    expect(grid.x.values).toEqual([expect.closeTo(1e-3, 15), expect.closeTo(1e-2, 14), expect.closeTo(1e-1, 13)]);
    expect(grid.y.values).toEqual([expect.closeTo(0.01, 15), expect.closeTo(0.03, 15)]);
    const parsed = parseScenarioDocument(JSON.parse(readFileSync(example("minkowski.json"), "utf8")));
    if (!parsed.ok || parsed.document.protocol.kind !== "segments") throw new Error("the example has a segment protocol");
    const { document } = parsed;
    const protocol = parsed.document.protocol;
    grid.y.values.forEach((hold: number, row: number) =>
      grid.x.values.forEach((recombination: number, column: number) => {
        const byHand = { ...document, protocol: { ...protocol, hold: { ...protocol.hold, durationSeconds: hold }, recombination: { ...protocol.recombination, durationSeconds: recombination } } };
        expect(grid.log10[row][column]).toBeCloseTo(computeScenario(byHand).combined.totalQuanta.log10!, 12);
      }),
    );
    // In flat spacetime a slower recombination radiates less (⟨N⟩ falls as 1/T² for smooth ramps).
    expect(grid.log10[0][2]).toBeLessThan(grid.log10[0][0]);

    const csv = await run([...args, ...axisY, "--format", "csv"]);
    expect(csv.stdout).toContain("# x: recombination-time from 0.001 to 0.1 (SI), 3 points, log spacing");
    const rows = csvRows(csv.stdout);
    expect(rows[0]).toEqual(["recombination_time_s", "hold_time_s", "total_quanta_count", "log10_total_quanta", "not_computed_because"]);
    expect(rows).toHaveLength(1 + 6);
    const summary = await run([...args, ...axisY, "--format", "table"]);
    expect(summary.stdout).toMatch(/smallest\s+\S+\s+at recombination-time = 0\.1 s, hold-time = 0\.0[13] s/);
  });

  it("refuses a map it cannot make with the option at fault and exit code 2", async () => {
    const same = await run(["map", example("minkowski.json"), "--x", "hold-time", "--y", "hold-time"]);
    expect(same.code).toBe(EXIT.badInput);
    expect(same.stderr).toContain("--y: the two axes must vary different parameters");
    const bad = await run(["map", example("minkowski.json"), "--x-from", "5", "--quantity", "brightness", "--y-points", "900", "--x-scale", "cubic"]);
    expect(bad.code).toBe(EXIT.badInput);
    for (const line of ["--x-from: ", "--quantity: must be total-quanta", "--y-points: must be a whole number from 2 to 200", "--x-scale: must be log or linear"]) expect(bad.stderr).toContain(line);
    const local = await run(["map", "--scenario", "p/s"]);
    expect(local.code).toBe(EXIT.badInput);
    expect(local.stderr).toContain("--scenario: maps a saved scenario on the server: add --remote");
  });

  it("needs a token and a pulled folder for pull and push, and says when the server cannot be reached", async () => {
    const pull = await run(["pull", "00000000-0000-4000-8000-000000000000", "--dir", path.join(root, ".data", "never")], { BRANCHLINE_TOKEN: "" });
    expect(pull.code).toBe(EXIT.badInput);
    expect(pull.stderr).toContain("BRANCHLINE_TOKEN");
    const push = await run(["push", "--dir", path.join(root, "examples")], { BRANCHLINE_TOKEN: "bltok_x" });
    expect(push.code).toBe(EXIT.badInput);
    expect(push.stderr).toContain("has no .branchline.json");
    const unreachable = await run(["sweep", example("minkowski.json"), "--vary", "hold-time", "--from", "1 ms", "--to", "2 ms", "--points", "2", "--remote"], { BRANCHLINE_URL: "http://127.0.0.1:9" });
    expect(unreachable.code).toBe(EXIT.unavailable);
    expect(unreachable.stderr).toContain("cannot reach http://127.0.0.1:9");
  });

  it("runs as a real process through the bin launcher", async () => {
    const child = (args: string[]) =>
      new Promise<{ status: number | null; stdout: string; stderr: string }>((resolve, reject) => {
        const p = spawn(process.execPath, [path.join(root, "bin/branchline.mjs"), ...args], { cwd: root });
        let stdout = "";
        let stderr = "";
        p.stdout.on("data", (d) => (stdout += d));
        p.stderr.on("data", (d) => (stderr += d));
        p.on("error", reject);
        p.on("close", (status) => resolve({ status, stdout, stderr }));
      });
    const help = await child(["sweep", "--help"]);
    expect(help.status, help.stderr).toBe(0);
    expect(help.stdout).toContain("usage: branchline sweep");
    const bad = await child(["compute", "examples/no-such-file.json"]);
    expect(bad.status).toBe(2);
    expect(bad.stderr).toContain("cannot read");
  }, 60_000);
});
