import { getDb } from "@/db";
import { cancelParameterMap, getParameterMap } from "@/db/parameter-maps";
import { mapResultQuerySchema } from "@/contracts/requests";
import { json, noContent, readQuery, requireActor, route } from "@/lib/http";
import { mapCsv } from "@/canvas/export/map-csv";
import { AppError } from "@/db/errors";

type Params = { mapId: string };

/**
 * A map: its status and progress (rows done of rows), and once done its grid — JSON by default, or with
 * ?format=csv one line per point with the inputs in the header (409 while the map is not done).
 */
export const GET = route<Params>(async (req, { mapId }) => {
  const actor = await requireActor(req);
  const { format } = readQuery(req, mapResultQuerySchema);
  const map = await getParameterMap(getDb(), actor, mapId);
  if (format === "json") return json({ map });
  if (!map.result) throw new AppError("conflict", `the map is ${map.status}; its grid is there once it is done`);
  return new Response(mapCsv(map), {
    headers: { "Content-Type": "text/csv; charset=utf-8", "Content-Disposition": `attachment; filename="map-${map.id}.csv"` },
  });
});

/** Cancels a queued or running map (200 with it, status cancelled); deletes a finished one (204). */
export const DELETE = route<Params>(async (req, { mapId }) => {
  const actor = await requireActor(req);
  const map = await cancelParameterMap(getDb(), actor, mapId);
  return map ? json({ map }) : noContent();
});
