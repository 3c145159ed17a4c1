/**
 * What changed between two JSON documents (two revisions of a scenario), as dotted paths with the old and new
 * values; and a document flattened to its leaves, for showing two versions' parameters side by side.
 * Pure and free of server code, like lib/contracts.ts: the history API uses it and so may the browser.
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

type Plain = Record<string, unknown>;

const isPlainObject = (v: unknown): v is Plain => typeof v === "object" && v !== null && !Array.isArray(v);
const join = (base: string, key: string | number) => (base ? `${base}.${key}` : String(key));

/**
 * The changes from `before` to `after`, keys in alphabetical order at each level (stored JSON keeps no order of
 * its own: PostgreSQL's jsonb sorts keys by length), array items by index.
 */
export function diffDocuments(before: unknown, after: unknown, limit = MAX_REPORTED_CHANGES): DocumentDiff {
  const changes: DocumentChange[] = [];
  let truncated = false;

  const report = (change: DocumentChange): boolean => {
    if (changes.length >= limit) {
      truncated = true;
      return false;
    }
    changes.push(change);
    return true;
  };

  // Returns false once the limit is reached, so the walk stops early on very large documents.
  const walk = (a: unknown, b: unknown, path: string): boolean => {
    if (isPlainObject(a) && isPlainObject(b)) {
      const keys = [...new Set([...Object.keys(a), ...Object.keys(b)])].sort();
      for (const key of keys) {
        const at = join(path, key);
        const ok = !(key in b)
          ? report({ path: at, kind: "removed", before: a[key] })
          : !(key in a)
            ? report({ path: at, kind: "added", after: b[key] })
            : walk(a[key], b[key], at);
        if (!ok) return false;
      }
      return true;
    }
    if (Array.isArray(a) && Array.isArray(b)) {
      for (let i = 0; i < Math.max(a.length, b.length); i++) {
        const ok =
          i >= b.length
            ? report({ path: join(path, i), kind: "removed", before: a[i] })
            : i >= a.length
              ? report({ path: join(path, i), kind: "added", after: b[i] })
              : walk(a[i], b[i], join(path, i));
        if (!ok) return false;
      }
      return true;
    }
    if (a === b) return true;
    return report({ path, kind: "changed", before: a, after: b });
  };

  walk(before, after, "");
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
  const walk = (value: unknown, path: string) => {
    if (isPlainObject(value)) {
      for (const [key, child] of Object.entries(value)) walk(child, join(path, key));
    } else if (Array.isArray(value)) {
      if (value.length > maxArrayItems) leaves.push({ path, value: { items: value.length } });
      else value.forEach((child, i) => walk(child, join(path, i)));
    } else {
      leaves.push({ path, value });
    }
  };
  walk(document, "");
  return leaves;
}
