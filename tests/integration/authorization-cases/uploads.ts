/** Authorization rows for what comes in: scenario imports, sequencer profiles, attachments. */
import type { Case } from "./shared";

export const uploadCases: Case[] = [];
