import { closedDaySchema } from "@/lib/booking/schemas";
import { addClosedDay } from "@/lib/server/dal/booking-setup";
import { apiRoute, created } from "@/lib/server/http/route";

// POST /api/booking/closed-days — admin: close a local day for the studio or for one fitter.
export const POST = apiRoute({ body: closedDaySchema }, async ({ actor, body }) => created(await addClosedDay(actor, body)));
