import { createBuild } from "@/lib/server/dal/builds";
import { apiRoute, created, idParams } from "@/lib/server/http/route";
import { buildFieldsSchema } from "@/lib/schemas/fitting";

// POST /api/fittings/{id}/builds — add a putter build to try.
export const POST = apiRoute({ params: idParams, body: buildFieldsSchema }, async ({ actor, params, body }) =>
  created(await createBuild(actor, params.id, body)),
);
