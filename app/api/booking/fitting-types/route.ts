import { fittingTypeSchema } from "@/lib/booking/schemas";
import { createFittingType } from "@/lib/server/dal/booking-setup";
import { apiRoute, created } from "@/lib/server/http/route";

// POST /api/booking/fitting-types — admin: a kind of fitting with its length, buffer and fee.
export const POST = apiRoute({ body: fittingTypeSchema }, async ({ actor, body }) => created(await createFittingType(actor, body)));
