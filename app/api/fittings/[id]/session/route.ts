import { getSession } from "@/lib/server/dal/session";
import { apiRoute, idParams } from "@/lib/server/http/route";

// GET /api/fittings/{id}/session — builds in order, the recording one, every putt with its state and key numbers, running summaries.
export const GET = apiRoute({ params: idParams }, ({ actor, params }) => getSession(actor, params.id));
