import { confirmBooking } from "@/lib/server/dal/bookings";
import { apiRoute, idParams } from "@/lib/server/http/route";

// POST /api/booking/bookings/{id}/confirm — staff: take the request; the golfer gets the confirmation with an .ics.
export const POST = apiRoute({ params: idParams }, ({ actor, params }) => confirmBooking(actor, params.id));
