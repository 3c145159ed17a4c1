/**
 * Reversible patches between two versions of a JSON document: each patch names a path and the value before and
 * after, so one list replays forwards (redo) and backwards (undo) exactly. A diff shares nothing mutable: values are
 * taken from immutable documents, and applying a patch copies only the objects along its path.
 */
import { type PathKey, walkDifferences } from "../../contracts/json-diff";

export type { PathKey };

export interface Patch {
  path: PathKey[];
  /** undefined: the key was absent. */
  before: unknown;
  after: unknown;
}

const isPlainObject = (v: unknown): v is Record<string, unknown> => typeof v === "object" && v !== null && !Array.isArray(v);

/** The patches from `before` to `after`: the one JSON diff walker, arrays of a new length replaced whole. */
export function diffValues(before: unknown, after: unknown): Patch[] {
  const patches: Patch[] = [];
  walkDifferences(before, after, (difference) => void patches.push(difference), { arrays: "whole" });
  return patches;
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
