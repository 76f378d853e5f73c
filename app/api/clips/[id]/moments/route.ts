import { momentsSchema, setMoments } from "@/lib/server/dal/clips";
import { apiRoute, idParams } from "@/lib/server/http/route";

// PUT /api/clips/{id}/moments — set or clear frame moments (the fitter confirms or moves the suggested impact).
export const PUT = apiRoute({ params: idParams, body: momentsSchema }, ({ actor, params, body }) =>
  setMoments(actor, params.id, body),
);
