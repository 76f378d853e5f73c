import { getStroke } from "@/lib/server/dal/strokes";
import { apiRoute, idParams } from "@/lib/server/http/route";

// GET /api/strokes/{id} — a stroke with its clips and the impact frame each is lined up at.
export const GET = apiRoute({ params: idParams }, ({ actor, params }) => getStroke(actor, params.id));
