import { listSpecsOfGolfer } from "@/lib/server/dal/specs";
import { apiRoute, idParams } from "@/lib/server/http/route";

// GET /api/golfers/{id}/specs — the golfer's specs, the current one first (superseded ones kept).
export const GET = apiRoute({ params: idParams }, async ({ actor, params }) => ({ specs: await listSpecsOfGolfer(actor, params.id) }));
