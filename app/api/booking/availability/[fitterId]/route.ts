import { z } from "zod";
import { weeklyRulesSchema } from "@/lib/booking/schemas";
import { replaceWeeklyRules } from "@/lib/server/dal/booking-setup";
import { apiRoute } from "@/lib/server/http/route";

const params = z.object({ fitterId: z.string().uuid("must be an id (uuid)") });

// PUT /api/booking/availability/{fitterId} — admin: replace a fitter's weekly opening hours (local times).
export const PUT = apiRoute({ params, body: weeklyRulesSchema }, ({ actor, params, body }) => replaceWeeklyRules(actor, params.fitterId, body));
