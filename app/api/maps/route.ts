import { getDb } from "@/db";
import { createParameterMap } from "@/db/parameter-maps";
import { mapCreateSchema } from "@/contracts/requests";
import { readJson, requireActor, route } from "@/lib/http";
import { enqueueMapRows } from "@/lib/map-queue";
import { NextResponse } from "next/server";

/**
 * Starts a parameter map: 202 with the map (status queued) and its URL (also in Location), where GET follows its
 * progress and, once done, gives the grid. Signed-in callers only; a map of a saved scenario needs the right to
 * edit it (docs in db/parameter-maps.ts). 400 names the field a map cannot be made with; 422 compute_too_costly when
 * a point would cost more than one computation may; 429 past the number of maps one account may run at once.
 */
export const POST = route(async (req) => {
  const actor = await requireActor(req);
  const body = await readJson(req, mapCreateSchema);
  const map = await createParameterMap(
    getDb(),
    actor,
    { scenario: body.scenario, document: body.document, request: { x: body.x, y: body.y, quantity: body.quantity } },
    enqueueMapRows,
  );
  return NextResponse.json({ map }, { status: 202, headers: { Location: map.url } });
});
