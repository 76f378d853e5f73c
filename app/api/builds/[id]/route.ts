import { updateBuild } from "@/lib/server/dal/builds";
import { apiRoute, idParams } from "@/lib/server/http/route";
import { buildUpdateSchema } from "@/lib/schemas/fitting";

// PATCH /api/builds/{id} — change a build's specification.
export const PATCH = apiRoute({ params: idParams, body: buildUpdateSchema }, ({ actor, params, body }) =>
  updateBuild(actor, params.id, body),
);
