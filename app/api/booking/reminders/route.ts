import { sendDueReminders } from "@/lib/server/dal/bookings";
import { apiRoute } from "@/lib/server/http/route";

// POST /api/booking/reminders — staff: e-mail reminders (with .ics) for confirmed visits in the next 24 h, once each.
export const POST = apiRoute({}, ({ actor }) => sendDueReminders(actor));
