/**
 * Whether two scenario documents differ only in how the figures look (the `display` block): such a change does not
 * alter any computed number, so a save of it amends the version it was made on instead of starting a new one.
 * Key order is ignored (stored JSON keeps none of its own).
 */
export function differsOnlyInDisplay(stored: unknown, next: unknown): boolean {
  if (!isRecord(stored) || !isRecord(next)) return false;
  const { display: _storedDisplay, ...storedRest } = stored;
  const { display: _nextDisplay, ...nextRest } = next;
  return canonicalJson(storedRest) === canonicalJson(nextRest);
}

function isRecord(value: unknown): value is Record<string, unknown> {
  return typeof value === "object" && value !== null && !Array.isArray(value);
}

/** JSON with every object's keys sorted, so equal documents give equal text whatever their key order. */
function canonicalJson(value: unknown): string {
  if (Array.isArray(value)) return `[${value.map(canonicalJson).join(",")}]`;
  if (isRecord(value)) {
    const entries = Object.keys(value)
      .filter((key) => value[key] !== undefined)
      .sort()
      .map((key) => `${JSON.stringify(key)}:${canonicalJson(value[key])}`);
    return `{${entries.join(",")}}`;
  }
  return JSON.stringify(value) ?? "null";
}
