import { z } from "zod";
import { fittingMeasurementsCsv } from "@/lib/server/dal/exports";
import { apiRoute, idParams } from "@/lib/server/http/route";

const query = z.object({ layout: z.enum(["long", "wide"]).default("long") });

// GET /api/fittings/{id}/csv?layout=long|wide — the fitting's measurements as CSV: one row per clip per measurement, or one row per putt.
export const GET = apiRoute({ params: idParams, query }, async ({ actor, params, query }) => {
  const csv = await fittingMeasurementsCsv(actor, params.id, query.layout);
  return new Response(csv, {
    headers: {
      "content-type": "text/csv; charset=utf-8",
      "content-disposition": `attachment; filename="fitting-${params.id}-measurements${query.layout === "wide" ? "-wide" : ""}.csv"`,
      "cache-control": "private, no-store",
    },
  });
});
