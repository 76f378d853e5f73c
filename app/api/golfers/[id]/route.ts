import { getGolfer, updateGolfer } from "@/lib/server/dal/golfers";
import { apiRoute, idParams } from "@/lib/server/http/route";
import { golferUpdateSchema } from "@/lib/schemas/golfer";

// GET /api/golfers/{id} — one golfer with intake.
export const GET = apiRoute({ params: idParams }, ({ actor, params }) => getGolfer(actor, params.id));

// PATCH /api/golfers/{id} — change name, handedness or intake.
export const PATCH = apiRoute({ params: idParams, body: golferUpdateSchema }, ({ actor, params, body }) =>
  updateGolfer(actor, params.id, body),
);
