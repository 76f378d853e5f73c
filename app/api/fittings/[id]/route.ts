import { getFitting, updateFitting } from "@/lib/server/dal/fittings";
import { apiRoute, idParams } from "@/lib/server/http/route";
import { fittingUpdateSchema } from "@/lib/schemas/fitting";

// GET /api/fittings/{id} — a fitting with its builds.
export const GET = apiRoute({ params: idParams }, ({ actor, params }) => getFitting(actor, params.id));

// PATCH /api/fittings/{id} — reschedule, change status or notes.
export const PATCH = apiRoute({ params: idParams, body: fittingUpdateSchema }, ({ actor, params, body }) =>
  updateFitting(actor, params.id, body),
);
