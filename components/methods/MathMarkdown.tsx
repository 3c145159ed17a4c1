import katex from "katex";
import { marked } from "marked";

const mathPattern = /\$\$([\s\S]+?)\$\$|\$([^$\n]+?)\$/g;

/**
 * Markdown with TeX between $…$ (inline) and $$…$$ (display), rendered on the server: the math is set aside,
 * the prose goes through marked, and KaTeX's HTML is put back where each formula stood.
 */
export function renderMathMarkdown(source: string): string {
  const formulas: string[] = [];
  const withPlaceholders = source.replace(mathPattern, (_, display: string | undefined, inline: string | undefined) => {
    const tex = (display ?? inline ?? "").trim();
    formulas.push(katex.renderToString(tex, { displayMode: display !== undefined, throwOnError: false, strict: "ignore" }));
    return `@@MATH${formulas.length - 1}@@`;
  });
  const html = marked.parse(withPlaceholders, { async: false, gfm: true });
  return html.replace(/@@MATH(\d+)@@/g, (_, i: string) => formulas[Number(i)]);
}

export function MathMarkdown({ source }: { source: string }) {
  return <div className="methods-prose" dangerouslySetInnerHTML={{ __html: renderMathMarkdown(source) }} />;
}
