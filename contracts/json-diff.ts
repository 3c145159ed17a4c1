/**
 * What changed between two JSON documents (two revisions of a scenario), as dotted paths with the old and new
 * values; and a document flattened to its leaves, for showing two versions' parameters side by side.
 * Pure and free of server code: the history API, the History panel and the editor's undo (canvas/store/patches.ts)
 * all read differences through the one walker here.
 */

export interface DocumentChange {
  /** Dotted path into the document, array items by index: "protocol.hold.durationSeconds", "protocol.samples.3". */
  path: string;
  kind: "changed" | "added" | "removed";
  /** The value before (absent when added) and after (absent when removed); whole subtrees for added or removed parts. */
  before?: unknown;
  after?: unknown;
}

export interface DocumentDiff {
  changes: DocumentChange[];
  /** True when there were more changes than the limit and only the first were reported. */
  truncated: boolean;
}

/** Enough to read a change between two revisions; a resampled profile of a million points is not listed point by point. */
export const MAX_REPORTED_CHANGES = 200;

export type PathKey = string | number;

/** One place where two JSON values differ; `undefined` on a side: the key or item is absent there. */
export interface Difference {
  path: PathKey[];
  before: unknown;
  after: unknown;
}

export interface WalkOptions {
  /**
   * "items": arrays are compared item by item, extra items reported as absent on the other side (for reading a
   * change); "whole": arrays of different lengths are one difference (for replaying edits exactly, as undo does).
   */
  arrays: "items" | "whole";
  /** Object keys in alphabetical order at each level (stored JSON keeps no order of its own), else as found. */
  sortKeys?: boolean;
}

const isPlainObject = (v: unknown): v is Record<string, unknown> => typeof v === "object" && v !== null && !Array.isArray(v);

/**
 * The one JSON diff walker: calls `visit` for each place where `before` and `after` differ, deepest first where
 * both sides are objects (or arrays, per `options.arrays`), else at the highest path where they part. Stops as
 * soon as `visit` returns false. The history API and the editor's undo both read their differences from here.
 */
export function walkDifferences(before: unknown, after: unknown, visit: (difference: Difference) => boolean | void, options: WalkOptions): void {
  const walk = (a: unknown, b: unknown, path: PathKey[]): boolean => {
    if (Object.is(a, b)) return true;
    if (isPlainObject(a) && isPlainObject(b)) {
      const keys = [...new Set([...Object.keys(a), ...Object.keys(b)])];
      if (options.sortKeys) keys.sort();
      return keys.every((key) => walk(a[key], b[key], [...path, key]));
    }
    if (Array.isArray(a) && Array.isArray(b) && (options.arrays === "items" || a.length === b.length)) {
      for (let i = 0; i < Math.max(a.length, b.length); i++) if (!walk(a[i], b[i], [...path, i])) return false;
      return true;
    }
    return visit({ path, before: a, after: b }) !== false;
  };
  walk(before, after, []);
}

const dotted = (path: PathKey[]) => path.join(".");

/**
 * The changes from `before` to `after`, keys in alphabetical order at each level (stored JSON keeps no order of
 * its own: PostgreSQL's jsonb sorts keys by length), array items by index.
 */
export function diffDocuments(before: unknown, after: unknown, limit = MAX_REPORTED_CHANGES): DocumentDiff {
  const changes: DocumentChange[] = [];
  let truncated = false;
  walkDifferences(
    before,
    after,
    ({ path, before: was, after: now }) => {
      if (changes.length >= limit) {
        truncated = true;
        return false;
      }
      const at = dotted(path);
      changes.push(now === undefined ? { path: at, kind: "removed", before: was } : was === undefined ? { path: at, kind: "added", after: now } : { path: at, kind: "changed", before: was, after: now });
    },
    { arrays: "items", sortKeys: true },
  );
  return { changes, truncated };
}

export interface FlatLeaf {
  path: string;
  /** A number, string, boolean or null; or, for a long array, a summary such as { items: 1000 }. */
  value: unknown;
}

/** A document's leaves in document order; arrays longer than `maxArrayItems` are one leaf counting their items. */
export function flattenDocument(document: unknown, maxArrayItems = 12): FlatLeaf[] {
  const leaves: FlatLeaf[] = [];
  const walk = (value: unknown, path: PathKey[]) => {
    if (isPlainObject(value)) {
      for (const [key, child] of Object.entries(value)) walk(child, [...path, key]);
    } else if (Array.isArray(value) && value.length <= maxArrayItems) {
      value.forEach((child, i) => walk(child, [...path, i]));
    } else {
      leaves.push({ path: dotted(path), value: Array.isArray(value) ? { items: value.length } : value });
    }
  };
  walk(document, []);
  return leaves;
}
