/**
 * What text Branchline keeps: Unicode text without NUL. A NUL (U+0000) is refused because PostgreSQL cannot store it
 * in text or jsonb; a lone UTF-16 surrogate (a high one not followed by a low one, or a low one alone) because it is
 * not a Unicode character at all and cannot be written as UTF-8.
 */

import { z } from "zod";

/** Why the text cannot be kept, in words, or null when it can. */
export function textProblem(text: string): string | null {
  if (text.includes("\u0000")) return "must not contain a NUL character (U+0000)";
  if (/[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/.test(text)) return "must not contain a lone UTF-16 surrogate (not Unicode text)";
  return null;
}

interface Visit {
  value: unknown;
  key: string | null;
  parent: Visit | null;
}

function pathOf(visit: Visit): string {
  const keys: string[] = [];
  for (let at: Visit | null = visit; at && at.key !== null; at = at.parent) keys.unshift(at.key.replace(/[\u0000\uD800-\uDFFF]/g, "\uFFFD"));
  return keys.join(".");
}

/**
 * The first string (keys included) in a JSON value that cannot be kept, with its dotted path, or null. Walks
 * iteratively with parent links, so a deeply nested body costs neither stack nor copied paths.
 */
export function firstTextProblem(value: unknown): { path: string; message: string } | null {
  const stack: Visit[] = [{ value, key: null, parent: null }];
  while (stack.length > 0) {
    const visit = stack.pop()!;
    const v = visit.value;
    if (typeof v === "string") {
      const problem = textProblem(v);
      if (problem) return { path: pathOf(visit), message: problem };
    } else if (Array.isArray(v)) {
      for (let i = v.length - 1; i >= 0; i--) stack.push({ value: v[i], key: String(i), parent: visit });
    } else if (v !== null && typeof v === "object") {
      for (const [key, child] of Object.entries(v)) {
        const keyProblem = textProblem(key);
        if (keyProblem) return { path: pathOf({ value: child, key, parent: visit }), message: `a key ${keyProblem}` };
        stack.push({ value: child, key, parent: visit });
      }
    }
  }
  return null;
}

/** A zod string that refuses what textProblem refuses (typeError: the message when the value is not a string). */
export const keptText = (typeError?: string) =>
  z.string(typeError ? { error: typeError } : undefined).superRefine((value, ctx) => {
    const problem = textProblem(value);
    if (problem) ctx.addIssue({ code: "custom", message: problem });
  });
