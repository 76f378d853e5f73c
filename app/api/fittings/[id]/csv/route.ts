import { fittingMeasurementsCsv } from "@/lib/server/dal/exports";
import { apiRoute, idParams } from "@/lib/server/http/route";

// GET /api/fittings/{id}/csv — the fitting's measurements as CSV, one row per clip per measurement.
export const GET = apiRoute({ params: idParams }, async ({ actor, params }) => {
  const csv = await fittingMeasurementsCsv(actor, params.id);
  return new Response(csv, {
    headers: {
      "content-type": "text/csv; charset=utf-8",
      "content-disposition": `attachment; filename="fitting-${params.id}-measurements.csv"`,
      "cache-control": "private, no-store",
    },
  });
});
