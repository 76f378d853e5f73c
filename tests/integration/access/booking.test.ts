// Access matrix for the booking routes: public pages, the golfer's own bookings, the
// studio's diary and settings. Each state-changing call gets a fresh booking.
import { randomBytes } from "node:crypto";
import { all, golferOf, readGolfer, runMatrix, writeGolfer, type MatrixCase, type Target } from "../../support/matrix";
import { db, schema } from "@/db";
import { freeSlots, insertBooking, withBooking, type BookingWorld } from "../booking/booking-world";

type W = BookingWorld & { bookings: Record<Target, string> };

const fresh = async (w: W, t: Target) => (await insertBooking(w, golferOf(w, t))).id;
const studioOf = (w: W, t: Target) => (t === "other" ? { slug: w.studioB.slug, type: w.types.B.id } : { slug: w.studioA.slug, type: w.types.A.id });
const publicAll = { admin: 200, fitter: 200, coach: 200, golfer: 200, anon: 200 };
const settingsOnly = (ok: number) => ({ admin: ok, fitter: 403, coach: 403, golfer: 403, anon: 401 });
/** Cancel/move/pay: the golfer on its own booking too. */
const golferOrStaff = (ok: number) => ({
  own: { admin: ok, fitter: ok, coach: 403, golfer: ok, anon: 401 },
  sibling: { admin: ok, fitter: ok, coach: 404, golfer: 404, anon: 401 },
  other: all(404),
});

const cases: MatrixCase<W>[] = [
  { route: "GET /api/booking/studios/{slug}", request: (w) => ({ method: "GET", path: `/api/booking/studios/${w.studioA.slug}` }), expect: { any: publicAll } },
  { route: "GET /api/booking/studios/{slug}/slots", request: (w) => ({ method: "GET", path: `/api/booking/studios/${w.studioA.slug}/slots?fittingTypeId=${w.types.A.id}&days=7` }), expect: { any: publicAll } },
  {
    route: "POST /api/booking/studios/{slug}/accounts",
    request: (w) => ({ method: "POST", path: `/api/booking/studios/${w.studioA.slug}/accounts`, body: { name: "New", email: `new.${randomBytes(4).toString("hex")}@test.fitframe`, password: "a long password" } }),
    expect: { any: all(201, 201) },
  },
  {
    route: "POST /api/booking/studios/{slug}/bookings",
    request: async (w) => {
      const slot = (await freeSlots(w.studioA.slug, w.types.A.id))[0]!;
      return { method: "POST", path: `/api/booking/studios/${w.studioA.slug}/bookings`, body: { fittingTypeId: w.types.A.id, fitterUserId: slot.fitterUserId, startsAt: slot.start } };
    },
    expect: { any: { admin: 403, fitter: 403, coach: 403, golfer: 201, anon: 401 } },
  },
  { route: "GET /api/booking/bookings", request: () => ({ method: "GET", path: "/api/booking/bookings" }), expect: { any: { admin: 200, fitter: 200, coach: 403, golfer: 200, anon: 401 } } },
  { route: "GET /api/booking/bookings/{id}", request: (w, t) => ({ method: "GET", path: `/api/booking/bookings/${w.bookings[t]}` }), expect: readGolfer },
  { route: "POST /api/booking/bookings/{id}/confirm", request: async (w, t) => ({ method: "POST", path: `/api/booking/bookings/${await fresh(w, t)}/confirm` }), expect: writeGolfer(200) },
  { route: "POST /api/booking/bookings/{id}/decline", request: async (w, t) => ({ method: "POST", path: `/api/booking/bookings/${await fresh(w, t)}/decline` }), expect: writeGolfer(200) },
  { route: "POST /api/booking/bookings/{id}/cancel", request: async (w, t) => ({ method: "POST", path: `/api/booking/bookings/${await fresh(w, t)}/cancel` }), expect: golferOrStaff(200) },
  {
    route: "POST /api/booking/bookings/{id}/reschedule",
    request: async (w, t) => {
      const slot = (await freeSlots(studioOf(w, t).slug, studioOf(w, t).type))[0]!;
      return { method: "POST", path: `/api/booking/bookings/${await fresh(w, t)}/reschedule`, body: { startsAt: slot.start } };
    },
    expect: golferOrStaff(200),
  },
  { route: "POST /api/booking/bookings/{id}/pay", request: async (w, t) => ({ method: "POST", path: `/api/booking/bookings/${await fresh(w, t)}/pay` }), expect: golferOrStaff(201) },
  { route: "GET /api/booking/availability", request: () => ({ method: "GET", path: "/api/booking/availability" }), expect: { any: settingsOnly(200) } },
  {
    route: "PUT /api/booking/availability/{fitterId}",
    request: (w, t) => ({ method: "PUT", path: `/api/booking/availability/${t === "other" ? w.otherAdmin.id : w.fitter2.id}`, body: { rules: [{ weekday: 1, start: "10:00", end: "12:00" }] } }),
    expect: { own: settingsOnly(200), other: { admin: 404, fitter: 403, coach: 403, golfer: 403, anon: 401 } },
  },
  { route: "POST /api/booking/closed-days", request: () => ({ method: "POST", path: "/api/booking/closed-days", body: { day: "2027-12-25", reason: "holiday" } }), expect: { any: settingsOnly(201) } },
  {
    route: "DELETE /api/booking/closed-days/{id}",
    request: async (w, t) => {
      const [row] = await db.insert(schema.closedDays).values({ studioId: t === "other" ? w.studioB.id : w.studioA.id, day: "2027-12-26" }).returning();
      return { method: "DELETE", path: `/api/booking/closed-days/${row!.id}` };
    },
    expect: { own: settingsOnly(204), other: { admin: 404, fitter: 403, coach: 403, golfer: 403, anon: 401 } },
  },
  { route: "POST /api/booking/fitting-types", request: () => ({ method: "POST", path: "/api/booking/fitting-types", body: { name: "Short check", durationMin: 30, feeMinor: 4000 } }), expect: { any: settingsOnly(201) } },
  {
    route: "PATCH /api/booking/fitting-types/{id}",
    request: (w, t) => ({ method: "PATCH", path: `/api/booking/fitting-types/${t === "other" ? w.types.B.id : w.types.A.id}`, body: { feeMinor: 9500 } }),
    expect: { own: settingsOnly(200), other: { admin: 404, fitter: 403, coach: 403, golfer: 403, anon: 401 } },
  },
  { route: "PATCH /api/booking/settings", request: () => ({ method: "PATCH", path: "/api/booking/settings", body: { cancelNoticeHours: 48 } }), expect: { any: settingsOnly(200) } },
  { route: "POST /api/booking/reminders", request: () => ({ method: "POST", path: "/api/booking/reminders" }), expect: { any: { admin: 200, fitter: 200, coach: 403, golfer: 403, anon: 401 } } },
  { route: "POST /api/payments/webhook (unsigned)", request: () => ({ method: "POST", path: "/api/payments/webhook", body: { id: "evt_x", type: "checkout.session.completed" } }), expect: { any: all(400, 400) } },
];

runMatrix("booking", cases, async (w) => {
  const bw = await withBooking(w);
  const bookings = {} as Record<Target, string>;
  for (const t of ["own", "sibling", "other"] as const) bookings[t] = (await insertBooking(bw, golferOf(bw, t))).id;
  return { ...bw, bookings };
});
