import "server-only";
import type { Kysely } from "kysely";
import type { Database } from "./schema";

/**
 * The result cache of saved scenarios, one row per scenario: the outcome computed for (scenario, version) by one
 * build (engineKey). A save makes a new version, so an older row simply stops matching; storing the new one
 * replaces it. No access check here: callers reach a scenario through one first (a share link, a membership).
 */
export interface CachedOutcome {
  outcome: unknown;
  computedAt: Date;
}

export interface ResultKey {
  scenarioId: string;
  version: number;
  engineKey: string;
}

export async function readCachedOutcome(db: Kysely<Database>, key: ResultKey): Promise<CachedOutcome | null> {
  const row = await db
    .selectFrom("scenarioResults")
    .select(["outcome", "computedAt"])
    .where("scenarioId", "=", key.scenarioId)
    .where("version", "=", key.version)
    .where("engineKey", "=", key.engineKey)
    .executeTakeFirst();
  return row ?? null;
}

/** Stores the outcome for the key, replacing what the scenario had (an older version, or another build's). */
export async function storeCachedOutcome(db: Kysely<Database>, key: ResultKey, outcome: unknown): Promise<void> {
  const values = { scenarioId: key.scenarioId, version: key.version, engineKey: key.engineKey, outcome: JSON.stringify(outcome), computedAt: new Date() };
  try {
    await db.transaction().execute(async (trx) => {
      await trx.deleteFrom("scenarioResults").where("scenarioId", "=", key.scenarioId).where("version", "<>", key.version).execute();
      await trx
        .insertInto("scenarioResults")
        .values(values)
        .onConflict((oc) => oc.columns(["scenarioId", "version"]).doUpdateSet({ engineKey: values.engineKey, outcome: values.outcome, computedAt: values.computedAt }))
        .execute();
    });
  } catch (error) {
    // A scenario deleted meanwhile has nothing to cache for (foreign key violation): nothing is lost.
    if ((error as { code?: string }).code !== "23503") throw error;
  }
}
