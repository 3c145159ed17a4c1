/**
 * The Content-Security-Policy of every page, built per request with a fresh nonce (proxy.ts), following Next.js's
 * nonce recipe: the proxy puts the policy on the request, and Next.js stamps the nonce on its own inline and chunk
 * scripts; 'strict-dynamic' lets those scripts load the rest (chunks, the Budget's web worker). What each part
 * allows and why:
 * - script-src: only nonce-carrying scripts and what they load; 'unsafe-eval' in development only (React's dev
 *   build evaluates source maps).
 * - style-src 'unsafe-inline': KaTeX and React set style attributes, which nonces cannot cover; styles cannot run
 *   script in current browsers.
 * - img-src and font-src data: blob:: figure export (html-to-image) draws the page into data: images with fonts
 *   inlined as data: URLs, and downloads go through blob: URLs.
 * - worker-src 'self' blob:: the Budget's web worker is a same-origin module (bundlers may wrap it in a blob:).
 * - frame-ancestors: an embed may be framed by any page (slides, other sites); every other page by none.
 * - object-src 'none', base-uri 'self', form-action 'self': no plugins, no <base> hijack, forms post here only.
 * CSP Level 3 (W3C) for the directives; Next.js docs, "Content Security Policy" guide, for the nonce recipe.
 */

export function newNonce(): string {
  const bytes = new Uint8Array(16);
  crypto.getRandomValues(bytes);
  return btoa(String.fromCharCode(...bytes));
}

export function pageContentSecurityPolicy(options: { nonce: string; pathname: string; development: boolean }): string {
  const embed = options.pathname === "/embed" || options.pathname.startsWith("/embed/");
  const directives: Record<string, string[]> = {
    "default-src": ["'self'"],
    "script-src": ["'self'", `'nonce-${options.nonce}'`, "'strict-dynamic'", ...(options.development ? ["'unsafe-eval'"] : [])],
    "style-src": ["'self'", "'unsafe-inline'"],
    "img-src": ["'self'", "data:", "blob:"],
    "font-src": ["'self'", "data:"],
    "connect-src": ["'self'", ...(options.development ? ["ws:"] : [])],
    "worker-src": ["'self'", "blob:"],
    "frame-src": ["'self'"],
    "object-src": ["'none'"],
    "base-uri": ["'self'"],
    "form-action": ["'self'"],
    "frame-ancestors": [embed ? "*" : "'none'"],
  };
  return Object.entries(directives)
    .map(([name, values]) => `${name} ${values.join(" ")}`)
    .join("; ");
}
