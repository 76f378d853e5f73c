import { rescheduleSchema } from "@/lib/booking/schemas";
import { rescheduleBooking } from "@/lib/server/dal/bookings";
import { apiRoute, idParams } from "@/lib/server/http/route";

// POST /api/booking/bookings/{id}/reschedule — move to another free slot (a golfer only with the studio's notice).
export const POST = apiRoute({ params: idParams, body: rescheduleSchema }, ({ actor, params, body }) => rescheduleBooking(actor, params.id, body));
