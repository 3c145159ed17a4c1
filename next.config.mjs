/**
 * Who may frame Branchline's pages. Embeds (/embed/…) exist to be framed by a talk's slides or any web page, so
 * any origin may; every other page may be framed by no one (clickjacking), said both the current way
 * (Content-Security-Policy frame-ancestors) and the old one (X-Frame-Options) for older browsers.
 */
export const frameHeaderRules = [
  { source: "/embed/:path*", headers: [{ key: "Content-Security-Policy", value: "frame-ancestors *" }] },
  {
    // Everything but /embed/…: the lookahead leaves those to the rule above (a path matches at most one rule).
    source: "/((?!embed/).*)",
    headers: [
      { key: "Content-Security-Policy", value: "frame-ancestors 'none'" },
      { key: "X-Frame-Options", value: "DENY" },
    ],
  },
];

/**
 * Said on every response, pages, API and static files alike: never guess a content type (a JSON answer or a
 * download is never run as a page), and send only the origin to other sites. The pages' Content-Security-Policy
 * (script-src with a nonce, object-src, base-uri) is built per request in proxy.ts.
 */
export const everyResponseHeaders = {
  source: "/:path*",
  headers: [
    { key: "X-Content-Type-Options", value: "nosniff" },
    { key: "Referrer-Policy", value: "strict-origin-when-cross-origin" },
  ],
};

/** @type {import('next').NextConfig} */
const nextConfig = {
  serverExternalPackages: ["pg", "nodemailer", "bcryptjs", "rate-limiter-flexible", "esbuild"],
  poweredByHeader: false,
  // Source maps for the browser's scripts only when asked for (BRANCHLINE_BROWSER_SOURCE_MAPS=1 at build time): the
  // editor's browser bench (tests/bench/editor-browser.ts, BRANCH_PROFILE=1) reads them to name where a drag's time goes.
  productionBrowserSourceMaps: process.env.BRANCHLINE_BROWSER_SOURCE_MAPS === "1",
  async headers() {
    return [...frameHeaderRules, everyResponseHeaders];
  },
};

export default nextConfig;
