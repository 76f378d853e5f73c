import { emailSpec } from "@/lib/server/dal/specs";
import { apiRoute, idParams } from "@/lib/server/http/route";

// POST /api/specs/{id}/email — send an issued spec to the golfer again, PDF attached.
export const POST = apiRoute({ params: idParams }, ({ actor, params }) => emailSpec(actor, params.id));
