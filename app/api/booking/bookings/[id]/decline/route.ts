import { declineBooking } from "@/lib/server/dal/bookings";
import { apiRoute, idParams } from "@/lib/server/http/route";

// POST /api/booking/bookings/{id}/decline — staff: turn the request down (a paid fee is refunded).
export const POST = apiRoute({ params: idParams }, ({ actor, params }) => declineBooking(actor, params.id));
