import "server-only";
import { notFound } from "next/navigation";
import { getDb } from "../db";
import type { Actor } from "../db/access";
import { AppError } from "../db/errors";
import { getProject } from "../db/projects";
import { assertScenarioInProject } from "../db/scenarios";
import { currentUser } from "./session";

/**
 * The status of a page under /projects/[projectId], settled before anything streams: a project or scenario the
 * signed-in visitor cannot see answers a real 404 (the same for one that does not exist). Signed-out visitors are
 * left to the page, which redirects them to sign in with the page's own path. The pages and the API still decide
 * access on their own: this only chooses the HTTP status.
 */
export async function requireVisibleProject(projectId: string, scenarioId?: string): Promise<void> {
  const user = await currentUser();
  if (!user) return;
  const actor: Actor = { userId: user.id, siteRole: user.siteRole };
  try {
    await getProject(getDb(), actor, projectId);
    if (scenarioId !== undefined) await assertScenarioInProject(getDb(), projectId, scenarioId);
  } catch (error) {
    if (error instanceof AppError && error.code === "not_found") notFound();
    throw error;
  }
}
