import { startPayment } from "@/lib/server/dal/booking-payments";
import { apiRoute, created, idParams } from "@/lib/server/http/route";

// POST /api/booking/bookings/{id}/pay — open the provider's payment page for the fee; answers { url }.
export const POST = apiRoute({ params: idParams }, async ({ actor, params }) => created(await startPayment(actor, params.id)));
