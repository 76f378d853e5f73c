import { clipPatchSchema } from "@/lib/schemas/clip-edit";
import { deleteClip, patchClip } from "@/lib/server/dal/clip-edits";
import { getClip } from "@/lib/server/dal/clips";
import { apiRoute, idParams } from "@/lib/server/http/route";

// GET /api/clips/{id} — the clip as the review screen needs it: state, frames, motion signal, moments.
export const GET = apiRoute({ params: idParams }, ({ actor, params }) => getClip(actor, params.id));

// PATCH /api/clips/{id} — move the putt to another build, set it aside as a mishit, change capture fps,
// mirroring, slow motion or tracking; recomputes the measurements.
export const PATCH = apiRoute({ params: idParams, body: clipPatchSchema }, ({ actor, params, body }) =>
  patchClip(actor, params.id, body),
);

// DELETE /api/clips/{id} — the clip with its marks, measurements, comments and files in the store.
export const DELETE = apiRoute({ params: idParams }, ({ actor, params }) => deleteClip(actor, params.id));
