import { rerunTracking } from "@/lib/server/dal/clips";
import { apiRoute, idParams } from "@/lib/server/http/route";

// POST /api/clips/{id}/tracking — run the clip's tracking pass again; hand marks stay as they are.
export const POST = apiRoute({ params: idParams }, ({ actor, params }) => rerunTracking(actor, params.id));
