import { getSpec } from "@/lib/server/dal/specs";
import { apiRoute, idParams } from "@/lib/server/http/route";

// GET /api/specs/{id} — one issued spec (a frozen copy; never changed).
export const GET = apiRoute({ params: idParams }, ({ actor, params }) => getSpec(actor, params.id));
