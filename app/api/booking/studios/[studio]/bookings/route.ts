import { bookingCreateSchema, slugParams } from "@/lib/booking/schemas";
import { createBooking } from "@/lib/server/dal/bookings";
import { apiRoute, created } from "@/lib/server/http/route";

// POST /api/booking/studios/{slug}/bookings — a signed-in golfer of the studio requests a free slot (409 if taken).
export const POST = apiRoute({ params: slugParams, body: bookingCreateSchema }, async ({ actor, params, body }) =>
  created(await createBooking(actor, params.studio, body)),
);
