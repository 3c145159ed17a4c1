/**
 * The Budget as a CSV file (RFC 4180: comma-separated, CRLF line ends, fields quoted where they hold a comma, a
 * quote or a line break, quotes doubled), in parts: the scenario's inputs, one "# key: value unit" comment
 * line each (so the numbers can be reproduced from the file alone); one row per number the Budget shows, with its
 * unit as the result spells it ("1" for a count) and the formula it comes from — the field channels, then with an
 * environment each environmental channel, every channel's share of the whole (the dominant one named so) and the
 * whole budget's total; then, with an environment, after an empty line, the margin of each environmental channel;
 * then, after an empty line, every validity flag once, with its status and words.
 */
import Papa from "papaparse";
import { channelTable, ENVIRONMENT_CHANNEL_WORDS } from "@/canvas/kernels/budget/channel-table";
import { sources, type SourceKey } from "@/physics/estimators/sources";
import type { ChannelResult, Quantity, ScenarioResult } from "@/physics/result";
import type { ScenarioDocument } from "@/physics/scenario/schema";

export const BUDGET_CSV_HEADER = ["quantity", "value", "unit", "source"] as const;
export const FLAGS_CSV_HEADER = ["flag", "status", "message"] as const;
export const MARGINS_CSV_HEADER = ["channel", "parameter", "now", "unit", "equals the field channels at", "outcome"] as const;

const CSV_OPTIONS = { newline: "\r\n", quotes: false } as const;

/** One CSV field, quoted only where it must be (papaparse's writer, as the sequencer reader uses its parser). */
export function csvField(text: string): string {
  return Papa.unparse([[text]], CSV_OPTIONS);
}

export function csvText(rows: readonly (readonly string[])[]): string {
  return `${Papa.unparse(rows.map((row) => [...row]), CSV_OPTIONS)}\r\n`;
}

/**
 * A quantity's value as a number a spreadsheet or a script reads: the double in JavaScript's shortest round-trip
 * form; beyond a double's range, mantissa and exponent from its log10 ("3.16e+400"); "0" for an exact zero.
 */
export function csvValue(q: Quantity): string {
  if (q.value !== null) return String(q.value);
  if (q.log10 === null) return "0";
  const exponent = Math.floor(q.log10);
  const mantissa = 10 ** (q.log10 - exponent);
  return `${Number(mantissa.toPrecision(15))}e${exponent >= 0 ? "+" : ""}${exponent}`;
}

const CHANNEL_WORDS = { electromagnetic: "electromagnetic", gravitational: "gravitational" } as const;

const CHANNEL_ROWS: { words: string; of(c: ChannelResult): Quantity | null }[] = [
  { words: "Quanta to null infinity ℐ⁺", of: (c) => c.farFieldQuanta },
  { words: "Quanta into the horizon", of: (c) => c.horizonQuanta },
  { words: "Ramp-driven quanta", of: (c) => c.rampDrivenQuanta },
  { words: "Hold-driven quanta", of: (c) => c.holdDrivenQuanta },
  { words: "Total quanta <N>", of: (c) => c.totalQuanta },
  { words: "Decoherence D", of: (c) => c.decoherence },
  { words: "Decoherence time", of: (c) => c.decoherenceTime },
];

function sourceText(key: SourceKey): string {
  const entry = sources[key];
  return entry ? `${entry.title} [${key}]` : key;
}

/** Units of the document's fields, read from the SI suffix of their names (schema: physics/scenario/schema.ts). */
const UNIT_SUFFIXES: [RegExp, string][] = [
  [/MetresPerSecondSquared$/, "m s^-2"],
  [/PerSecond$/, "s^-1"],
  [/OhmMetres$/, "ohm m"],
  [/Metres$/, "m"],
  [/Pascals$/, "Pa"],
  [/Kelvin$/, "K"],
  [/Hertz$/, "Hz"],
  [/Seconds$/, "s"],
  [/Kg$/, "kg"],
  [/Coulombs$/, "C"],
];

function unitOf(key: string): string | null {
  return UNIT_SUFFIXES.find(([suffix]) => suffix.test(key))?.[1] ?? null;
}

const oneLine = (text: string) => text.replace(/[\r\n]+/g, " ");

/**
 * The document as "# path: value unit" lines, depth first in the document's own order. A sampled profile is named
 * by its size, not listed (it may hold a million samples; the scenario file carries them).
 */
export function budgetInputLines(document: ScenarioDocument): string[] {
  const lines: string[] = [];
  const walk = (value: unknown, path: string) => {
    if (path === "protocol.samples" && Array.isArray(value)) {
      lines.push(`# ${path}: ${value.length} samples (timeSeconds s, separationMetres m; listed in the scenario file)`);
      return;
    }
    if (value !== null && typeof value === "object") {
      for (const [key, inner] of Object.entries(value)) walk(inner, path ? `${path}.${key}` : key);
      return;
    }
    const unit = typeof value === "number" ? unitOf(path) : null;
    lines.push(`# ${path}: ${value === null ? "null" : oneLine(String(value))}${unit ? ` ${unit}` : ""}`);
  };
  walk(document, "");
  return lines;
}

/** Every validity flag once: code, status (ok, note, caution, invalid, not-applicable) and words. */
export function budgetFlagRows(result: ScenarioResult): string[][] {
  return result.flags.map((f) => [f.code, f.status, oneLine(f.message)]);
}

export function budgetCsvRows(result: ScenarioResult): string[][] {
  const row = (words: string, q: Quantity | null): string[] | null => (q ? [words, csvValue(q), q.unit, sourceText(q.sourceKey)] : null);
  const rows: (string[] | null)[] = [];
  for (const channel of [result.electromagnetic, result.gravitational]) {
    const name = CHANNEL_WORDS[channel.channel];
    for (const r of CHANNEL_ROWS) rows.push(row(`${r.words} (${name})`, r.of(channel)));
    if (channel.comparison) {
      rows.push(row(`Hold rate into the horizon (${name})`, channel.holdRate));
      rows.push(row(`Hold rate, published estimate (${name})`, channel.comparison.estimateHoldRate));
      rows.push(row(`Hold rate, ratio computed to estimate (${name})`, channel.comparison.ratioExactToEstimate));
    }
  }
  rows.push(row("Total quanta <N> (both channels)", result.combined.totalQuanta));
  rows.push(row("Decoherence D (both channels)", result.combined.decoherence));
  rows.push(row("Decoherence time (both channels)", result.combined.decoherenceTime));
  if (result.environment) {
    for (const channel of result.environment.channels) {
      const name = ENVIRONMENT_CHANNEL_WORDS[channel.channel].toLowerCase();
      rows.push(row(`Quanta <N> (${name})`, channel.totalQuanta));
      rows.push(row(`Rate at full separation (${name})`, channel.holdRate));
      rows.push(row(`Decoherence time (${name})`, channel.decoherenceTime));
    }
    const table = channelTable(result);
    for (const r of table.rows) {
      if (r.share !== null) rows.push([`Share of the total (${r.words}${r.dominant ? ", dominant" : ""})`, String(r.share), "1", sourceText("environment-budget-total")]);
    }
    rows.push(row("Total quanta <N> (every channel)", result.environment.total.totalQuanta));
    rows.push(row("Decoherence D (every channel)", result.environment.total.decoherence));
    rows.push(row("Decoherence time (every channel)", result.environment.total.decoherenceTime));
  }
  return rows.filter((r): r is string[] => r !== null);
}

/** The margin of each environmental channel: its parameter now, and where it would equal the field channels. */
export function budgetMarginRows(result: ScenarioResult): string[][] {
  return channelTable(result).margins.map((m) => {
    const { outcome } = m;
    const at = outcome.kind === "crossing" ? csvValue(outcome.value) : "";
    const words = outcome.kind === "crossing" ? "crossing" : outcome.kind === "already-below" ? "already below" : `not reachable: ${oneLine(outcome.reason)}`;
    return [m.channelWords.toLowerCase(), m.parameterWords, csvValue(m.current), m.current.unit, at, words];
  });
}

export function budgetCsv(result: ScenarioResult, document: ScenarioDocument): string {
  const inputs = budgetInputLines(document).map((line) => `${line}\r\n`).join("");
  const margins = result.environment ? `${csvText([[...MARGINS_CSV_HEADER], ...budgetMarginRows(result)])}\r\n` : "";
  return `${inputs}${csvText([[...BUDGET_CSV_HEADER], ...budgetCsvRows(result)])}\r\n${margins}${csvText([[...FLAGS_CSV_HEADER], ...budgetFlagRows(result)])}`;
}
