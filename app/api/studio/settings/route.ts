import { getStudioSettings, updateStudioSettings } from "@/lib/server/dal/settings";
import { apiRoute } from "@/lib/server/http/route";
import { studioSettingsSchema } from "@/lib/schemas/settings";

// GET /api/studio/settings — the studio's windows, units, friction μ and camera defaults (admin).
export const GET = apiRoute({}, ({ actor }) => getStudioSettings(actor));

// PUT /api/studio/settings — replace the studio's settings (admin).
export const PUT = apiRoute({ body: studioSettingsSchema }, ({ actor, body }) => updateStudioSettings(actor, body));
