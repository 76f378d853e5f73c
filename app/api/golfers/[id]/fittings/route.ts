import { listFittingsOfGolfer } from "@/lib/server/dal/fittings";
import { apiRoute, idParams } from "@/lib/server/http/route";

// GET /api/golfers/{id}/fittings — a golfer's fittings, newest first.
export const GET = apiRoute({ params: idParams }, async ({ actor, params }) => ({
  fittings: await listFittingsOfGolfer(actor, params.id),
}));
