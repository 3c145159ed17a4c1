#!/usr/bin/env node
// The `branchline` command (package.json "bin"; `npx branchline` in a clone, or anywhere after `npm link`). The
// command line is TypeScript (scripts/cli/main.ts), run through tsx's API, both its CommonJS and ES module hooks
// as `node --import tsx` sets them, with this project's tsconfig wherever it is started from, so that it shares
// the app's code without a build step.
import path from "node:path";
import { fileURLToPath, pathToFileURL } from "node:url";

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "..");
process.env.TSX_TSCONFIG_PATH = path.join(root, "tsconfig.json");
const { register: registerCommonJs } = await import("tsx/cjs/api");
const { register: registerModules } = await import("tsx/esm/api");
registerCommonJs();
registerModules({ tsconfig: process.env.TSX_TSCONFIG_PATH });
// The project is CommonJS, so the module arrives as its exports object (under default when imported from here).
const loaded = await import(pathToFileURL(path.join(root, "scripts/cli/main.ts")).href);
const { main } = loaded.main ? loaded : loaded.default;
process.exitCode = await main(process.argv.slice(2));
