// Every migration, in order. Listed statically (rather than read from the folder at run time) so that the
// same list works under tsx, vitest and bundlers. Add each new migration here.
import type { Migration } from "kysely";
import * as createCoreTables from "./2026_12_01_000000_create_core_tables";
import * as addInvitationsShareLinksAudit from "./2026_12_01_120000_add_invitations_share_links_audit";
import * as widenProjectAudit from "./2026_12_02_010000_widen_project_audit";
import * as createAttachments from "./2026_12_02_020000_create_attachments";
import * as addSessionVersionsAndSignInLimits from "./2026_12_05_070000_add_session_versions_and_sign_in_limits";
import * as createScenarioResults from "./2026_12_05_090000_create_scenario_results";
import * as createApiTokens from "./2026_12_05_110000_create_api_tokens";
import * as createParameterMaps from "./2026_12_05_111500_create_parameter_maps";

export const migrations: Record<string, Migration> = {
  "2026_12_01_000000_create_core_tables": createCoreTables,
  "2026_12_01_120000_add_invitations_share_links_audit": addInvitationsShareLinksAudit,
  "2026_12_02_010000_widen_project_audit": widenProjectAudit,
  "2026_12_02_020000_create_attachments": createAttachments,
  "2026_12_05_070000_add_session_versions_and_sign_in_limits": addSessionVersionsAndSignInLimits,
  "2026_12_05_090000_create_scenario_results": createScenarioResults,
  "2026_12_05_110000_create_api_tokens": createApiTokens,
  "2026_12_05_111500_create_parameter_maps": createParameterMaps,
};
