import katex from "katex";

/** A formula typeset by KaTeX on the server: no script reaches the browser, only HTML and KaTeX's stylesheet. */
export function Formula({ tex, display = false }: { tex: string; display?: boolean }) {
  const html = katex.renderToString(tex, { displayMode: display, throwOnError: false, strict: "ignore", output: "htmlAndMathml" });
  return display ? <div className="overflow-x-auto py-2" dangerouslySetInnerHTML={{ __html: html }} /> : <span dangerouslySetInnerHTML={{ __html: html }} />;
}
