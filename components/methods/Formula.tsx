import katex from "katex";

/** A formula typeset by KaTeX on the server: no script reaches the browser, only HTML and KaTeX's stylesheet. */
export function Formula({ tex, display = false }: { tex: string; display?: boolean }) {
  const html = katex.renderToString(tex, { displayMode: display, throwOnError: false, strict: "ignore", output: "htmlAndMathml" });
  if (!display) return <span dangerouslySetInnerHTML={{ __html: html }} />;
  // A wide formula scrolls sideways; the keyboard can reach it (tab to it, then the arrow keys).
  return (
    <div
      className="overflow-x-auto py-2 focus-visible:outline-2 focus-visible:outline-focus"
      tabIndex={0}
      role="group"
      aria-label="formula"
      dangerouslySetInnerHTML={{ __html: html }}
    />
  );
}
