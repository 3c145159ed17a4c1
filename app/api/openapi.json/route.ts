import { json, route } from "@/lib/http";
import { openApiDocument } from "@/lib/openapi";

/** The OpenAPI 3.1 description of this API, built from the schemas the routes enforce. Needs no sign-in. */
export const GET = route(async () => json(openApiDocument()));
