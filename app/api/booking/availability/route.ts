import { bookingSetup } from "@/lib/server/dal/booking-setup";
import { apiRoute } from "@/lib/server/http/route";

// GET /api/booking/availability — admin: fitting types, opening hours per fitter, closed days, notice rule.
export const GET = apiRoute({}, ({ actor }) => bookingSetup(actor));
