import { bookingSettingsSchema } from "@/lib/booking/schemas";
import { updateBookingSettings } from "@/lib/server/dal/booking-setup";
import { apiRoute } from "@/lib/server/http/route";

// PATCH /api/booking/settings — admin: the notice rule (hours) and the fee currency.
export const PATCH = apiRoute({ body: bookingSettingsSchema }, ({ actor, body }) => updateBookingSettings(actor, body));
