import { NextResponse } from "next/server";
import { removeClosedDay } from "@/lib/server/dal/booking-setup";
import { apiRoute, idParams } from "@/lib/server/http/route";

// DELETE /api/booking/closed-days/{id} — admin: open the day again.
export const DELETE = apiRoute({ params: idParams }, async ({ actor, params }) => {
  await removeClosedDay(actor, params.id);
  return new NextResponse(null, { status: 204 });
});
