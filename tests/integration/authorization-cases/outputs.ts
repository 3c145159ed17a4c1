/** Authorization rows for what leaves Branchline: exports, embeds. */
import type { Case } from "./shared";

export const outputCases: Case[] = [];
