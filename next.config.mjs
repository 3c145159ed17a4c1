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

/** @type {import('next').NextConfig} */
const nextConfig = {
  serverExternalPackages: ["pg", "nodemailer", "bcryptjs", "rate-limiter-flexible", "esbuild"],
  poweredByHeader: false,
  async headers() {
    return frameHeaderRules;
  },
};

export default nextConfig;
