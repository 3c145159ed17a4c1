/**
 * The URL options of an embed, read leniently (an unknown value is ignored, never an error, since the URL is
 * typed by hand into slides): theme=light|dark, type=large (larger labels for projection), scrub=1 (a time
 * scrubber that plays the protocol along lab time).
 */
export interface EmbedOptions {
  /** null: the scenario's own figure theme. */
  theme: "light" | "dark" | null;
  largeType: boolean;
  scrub: boolean;
}

/** How much larger labels are with type=large. */
export const LARGE_TYPE_SCALE = 1.5;

type Query = Record<string, string | string[] | undefined>;

const first = (value: string | string[] | undefined) => (Array.isArray(value) ? value[0] : value);

export function embedOptions(query: Query): EmbedOptions {
  const theme = first(query.theme);
  const scrub = first(query.scrub);
  return {
    theme: theme === "light" || theme === "dark" ? theme : null,
    largeType: first(query.type) === "large",
    scrub: scrub === "1" || scrub === "true",
  };
}

/** The embed's URL for a share link's token, with the options that differ from the defaults. */
export function embedPath(token: string, options: Partial<EmbedOptions> = {}): string {
  const query = new URLSearchParams();
  if (options.theme) query.set("theme", options.theme);
  if (options.largeType) query.set("type", "large");
  if (options.scrub) query.set("scrub", "1");
  const text = query.toString();
  return `/embed/${encodeURIComponent(token)}${text ? `?${text}` : ""}`;
}

/** The snippet to paste into a page or a slide tool that takes HTML. */
export function embedSnippet(origin: string, token: string, options: Partial<EmbedOptions> = {}, title = "Branchline diagram"): string {
  const src = `${origin}${embedPath(token, options)}`.replace(/&/g, "&amp;");
  const escapedTitle = title.replace(/&/g, "&amp;").replace(/"/g, "&quot;").replace(/</g, "&lt;");
  return `<iframe src="${src}" title="${escapedTitle}" width="640" height="520" style="border:0" loading="lazy" allowfullscreen></iframe>`;
}
