import { z } from "zod";
import { withdrawCoach } from "@/lib/server/dal/coach-access";
import { apiRoute } from "@/lib/server/http/route";

const params = z.object({ id: z.string().uuid(), userId: z.string().uuid() });

// DELETE /api/golfers/{id}/coaches/{userId} — withdraw a coach's access to this golfer, effective at once (staff).
export const DELETE = apiRoute({ params }, ({ actor, params }) => withdrawCoach(actor, params.id, params.userId));
