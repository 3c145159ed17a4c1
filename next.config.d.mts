/** Types of next.config.mjs's exports, for the tests that read them (tests/unit/app/frame-headers.test.ts). */
import type { NextConfig } from "next";

export declare const frameHeaderRules: { source: string; headers: { key: string; value: string }[] }[];
export declare const everyResponseHeaders: { source: string; headers: { key: string; value: string }[] };
declare const nextConfig: NextConfig;
export default nextConfig;
