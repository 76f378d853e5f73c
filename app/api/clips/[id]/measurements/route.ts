import { listMeasurements } from "@/lib/server/dal/measurements";
import { apiRoute, idParams } from "@/lib/server/http/route";

// GET /api/clips/{id}/measurements — one entry per key of the clip's view, with the studio's window.
export const GET = apiRoute({ params: idParams }, ({ actor, params }) => listMeasurements(actor, params.id));
