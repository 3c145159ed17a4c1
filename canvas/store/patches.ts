/**
 * Reversible patches between two versions of a JSON document: each patch names a path and the value before and
 * after, so one list replays forwards (redo) and backwards (undo) exactly. A diff shares nothing mutable: values are
 * taken from immutable documents, and applying a patch copies only the objects along its path.
 */

export type PathKey = string | number;

export interface Patch {
  path: PathKey[];
  /** undefined: the key was absent. */
  before: unknown;
  after: unknown;
}

const isPlainObject = (v: unknown): v is Record<string, unknown> => typeof v === "object" && v !== null && !Array.isArray(v);

export function diffValues(before: unknown, after: unknown, path: PathKey[] = []): Patch[] {
  if (Object.is(before, after)) return [];
  if (isPlainObject(before) && isPlainObject(after)) {
    const keys = new Set([...Object.keys(before), ...Object.keys(after)]);
    return [...keys].flatMap((key) => diffValues(before[key], after[key], [...path, key]));
  }
  if (Array.isArray(before) && Array.isArray(after) && before.length === after.length) {
    return before.flatMap((item, i) => diffValues(item, after[i], [...path, i]));
  }
  return [{ path, before, after }];
}

function setIn(target: unknown, path: PathKey[], value: unknown): unknown {
  if (path.length === 0) return value;
  const [key, ...rest] = path;
  if (Array.isArray(target)) {
    const copy = target.slice();
    copy[key as number] = setIn(target[key as number], rest, value);
    return copy;
  }
  const source = isPlainObject(target) ? target : {};
  const copy: Record<string, unknown> = { ...source };
  const next = setIn(source[key as string], rest, value);
  if (next === undefined) delete copy[key as string];
  else copy[key as string] = next;
  return copy;
}

export function applyPatches<T>(document: T, patches: readonly Patch[], direction: "forward" | "backward"): T {
  const ordered = direction === "forward" ? patches : [...patches].reverse();
  let result: unknown = document;
  for (const patch of ordered) result = setIn(result, patch.path, direction === "forward" ? patch.after : patch.before);
  return result as T;
}

/** True when two JSON values hold the same data. */
export function sameData(a: unknown, b: unknown): boolean {
  return diffValues(a, b).length === 0;
}
