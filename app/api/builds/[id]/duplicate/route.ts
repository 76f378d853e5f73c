import { duplicateBuild } from "@/lib/server/dal/builds";
import { apiRoute, created, idParams } from "@/lib/server/http/route";
import { buildDuplicateSchema } from "@/lib/schemas/fitting";

// POST /api/builds/{id}/duplicate — copy a build with one thing changed; the copy goes last.
export const POST = apiRoute({ params: idParams, body: buildDuplicateSchema }, async ({ actor, params, body }) =>
  created(await duplicateBuild(actor, params.id, body)),
);
