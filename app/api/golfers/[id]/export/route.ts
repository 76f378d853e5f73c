import { NextResponse } from "next/server";
import { exportGolferData } from "@/lib/server/dal/exports";
import { apiRoute, idParams } from "@/lib/server/http/route";

// GET /api/golfers/{id}/export — everything stored about the golfer as JSON, clip links valid 15 minutes.
export const GET = apiRoute({ params: idParams }, async ({ actor, params }) => {
  const data = await exportGolferData(actor, params.id);
  return NextResponse.json(data, {
    headers: { "content-disposition": `attachment; filename="fitframe-data-${params.id}.json"`, "cache-control": "private, no-store" },
  });
});
