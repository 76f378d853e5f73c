import { getGolfer, updateGolfer } from "@/lib/server/dal/golfers";
import { eraseGolferData } from "@/lib/server/dal/exports";
import { apiRoute, idParams } from "@/lib/server/http/route";
import { golferEraseSchema, golferUpdateSchema } from "@/lib/schemas/golfer";

// GET /api/golfers/{id} — one golfer with intake.
export const GET = apiRoute({ params: idParams }, ({ actor, params }) => getGolfer(actor, params.id));

// PATCH /api/golfers/{id} — change name, handedness, intake or video consent.
export const PATCH = apiRoute({ params: idParams, body: golferUpdateSchema }, ({ actor, params, body }) =>
  updateGolfer(actor, params.id, body),
);

// DELETE /api/golfers/{id} — erase the golfer and all its data, clips' files included (irreversible).
export const DELETE = apiRoute({ params: idParams, body: golferEraseSchema }, ({ actor, params, body }) =>
  eraseGolferData(actor, params.id, body.confirm),
);
