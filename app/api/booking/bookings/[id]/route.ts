import { getBooking } from "@/lib/server/dal/bookings";
import { apiRoute, idParams } from "@/lib/server/http/route";

// GET /api/booking/bookings/{id} — one booking with its fee's payment state.
export const GET = apiRoute({ params: idParams }, ({ actor, params }) => getBooking(actor, params.id));
