import { bookingListQuery } from "@/lib/booking/schemas";
import { listBookings } from "@/lib/server/dal/bookings";
import { apiRoute } from "@/lib/server/http/route";

// GET /api/booking/bookings?from=&to= — staff: the studio's bookings in the span; a golfer: its own.
export const GET = apiRoute({ query: bookingListQuery }, ({ actor, query }) => listBookings(actor, query));
