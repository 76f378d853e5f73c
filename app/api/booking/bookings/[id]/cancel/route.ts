import { cancelBooking } from "@/lib/server/dal/bookings";
import { apiRoute, idParams } from "@/lib/server/http/route";

// POST /api/booking/bookings/{id}/cancel — the golfer (refund inside the notice rule) or staff (always refunded).
export const POST = apiRoute({ params: idParams }, ({ actor, params }) => cancelBooking(actor, params.id));
