import { getComparison } from "@/lib/server/dal/comparison";
import { apiRoute, idParams } from "@/lib/server/http/route";

// GET /api/fittings/{id}/comparison — statistics per build and measurement, make chances, a suggested build.
export const GET = apiRoute({ params: idParams }, async ({ actor, params }) => {
  const { comparison, settings, handedness } = await getComparison(actor, params.id);
  return { ...comparison, windows: settings.windows, units: settings.units, speedUnit: settings.speedUnit ?? "m/s", handedness };
});
