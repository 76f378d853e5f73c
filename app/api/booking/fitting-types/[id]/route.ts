import { fittingTypeUpdateSchema } from "@/lib/booking/schemas";
import { updateFittingType } from "@/lib/server/dal/booking-setup";
import { apiRoute, idParams } from "@/lib/server/http/route";

// PATCH /api/booking/fitting-types/{id} — admin: change length, buffer, fee, or retire it (active: false).
export const PATCH = apiRoute({ params: idParams, body: fittingTypeUpdateSchema }, ({ actor, params, body }) => updateFittingType(actor, params.id, body));
