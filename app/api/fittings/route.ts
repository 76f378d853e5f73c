import { createFitting } from "@/lib/server/dal/fittings";
import { apiRoute, created } from "@/lib/server/http/route";
import { fittingCreateSchema } from "@/lib/schemas/fitting";

// POST /api/fittings — book a fitting for a golfer of the studio.
export const POST = apiRoute({ body: fittingCreateSchema }, async ({ actor, body }) => created(await createFitting(actor, body)));
