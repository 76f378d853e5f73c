import { markCommentsRead } from "@/lib/server/dal/comments";
import { apiRoute, idParams } from "@/lib/server/http/route";

// POST /api/clips/{id}/comments/read — mark the clip's comments read by the signed-in person.
export const POST = apiRoute({ params: idParams }, ({ actor, params }) => markCommentsRead(actor, params.id));
