/**
 * The link from a number to its formula on the Methods page, opened beside the editor (a new tab) and carrying the
 * number as shown and what it was computed from, which the page echoes at the top.
 */
export interface MethodsEcho {
  /** What the number is, in the editor's words ("Into the horizon, electromagnetic"). */
  label: string;
  /** The number as the editor showed it, with its unit. */
  value: string;
  /** The inputs it came from, in words ("b = 3 r_s, d = 10 µm, hold 1.000 s"). */
  inputs?: string;
}

export function methodsHref(sourceKey: string, echo?: MethodsEcho): string {
  if (!echo) return `/methods#${sourceKey}`;
  const query = new URLSearchParams({ from: sourceKey, label: echo.label, value: echo.value });
  if (echo.inputs) query.set("inputs", echo.inputs);
  return `/methods?${query.toString()}#${sourceKey}`;
}

/** Attributes of a link that opens the Methods page beside the editor, never in its place. */
export const besideTheEditor = { target: "_blank", rel: "noopener" } as const;
