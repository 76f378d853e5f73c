import { coachGrantSchema } from "@/lib/schemas/invitations";
import { grantCoach, listCoachesOfGolfer } from "@/lib/server/dal/coach-access";
import { apiRoute, idParams } from "@/lib/server/http/route";

// GET /api/golfers/{id}/coaches — the coaches this golfer is shared with (staff).
export const GET = apiRoute({ params: idParams }, ({ actor, params }) => listCoachesOfGolfer(actor, params.id));

// POST /api/golfers/{id}/coaches — share this golfer with a coach of the studio (staff).
export const POST = apiRoute({ params: idParams, body: coachGrantSchema }, ({ actor, params, body }) => grantCoach(actor, params.id, body.coachUserId));
