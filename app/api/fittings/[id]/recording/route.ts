import { setRecordingBuild } from "@/lib/server/dal/fittings";
import { apiRoute, idParams } from "@/lib/server/http/route";
import { recordingSchema } from "@/lib/schemas/fitting";

// PUT /api/fittings/{id}/recording — the build new putts from the watch folder go to (null: none).
export const PUT = apiRoute({ params: idParams, body: recordingSchema }, ({ actor, params, body }) =>
  setRecordingBuild(actor, params.id, body.buildId),
);
