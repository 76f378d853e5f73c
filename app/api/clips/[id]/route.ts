import { clipSettingsSchema, getClip, updateClipSettings } from "@/lib/server/dal/clips";
import { apiRoute, idParams } from "@/lib/server/http/route";

// GET /api/clips/{id} — the clip as the review screen needs it: state, frames, motion signal, moments.
export const GET = apiRoute({ params: idParams }, ({ actor, params }) => getClip(actor, params.id));

// PATCH /api/clips/{id} — change capture fps, mirroring or slow-motion factor; recomputes the measurements.
export const PATCH = apiRoute({ params: idParams, body: clipSettingsSchema }, ({ actor, params, body }) =>
  updateClipSettings(actor, params.id, body),
);
