// Properties of the free-slot search over random opening hours and held spans, across the
// 2026 spring clock change in Europe/London (IANA tz database via luxon): a slot lasts exactly
// its duration in real time, never meets a held span or another slot of the same fitter (even
// when opening windows overlap), and
// stays inside the asked span and after the lead time.
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { freeSlots } from "@/lib/booking/slots";

const from = new Date("2026-03-23T00:00:00Z");
const to = new Date("2026-04-06T00:00:00Z");
const fitters = ["f1", "f2"];

const rule = fc.record({
  fitterUserId: fc.constantFrom(...fitters),
  weekday: fc.integer({ min: 1, max: 7 }),
  startMinute: fc.integer({ min: 0, max: 1380 }),
  length: fc.integer({ min: 15, max: 720 }),
}).map(({ length, ...r }) => ({ ...r, endMinute: Math.min(1440, r.startMinute + length) }));

const busy = fc.record({ fitterUserId: fc.constantFrom(...fitters), startMs: fc.integer({ min: from.getTime(), max: to.getTime() }), minutes: fc.integer({ min: 15, max: 300 }) })
  .map((b) => ({ fitterUserId: b.fitterUserId, start: new Date(b.startMs), blockedUntil: new Date(b.startMs + b.minutes * 60_000) }));

describe("free slots (properties)", () => {
  it("are sound for any opening hours and held spans", () => {
    fc.assert(fc.property(
      fc.array(rule, { maxLength: 6 }), fc.array(busy, { maxLength: 8 }), fc.integer({ min: 15, max: 180 }), fc.integer({ min: 0, max: 60 }), fc.integer({ min: 0, max: 5 * 86_400_000 }),
      (rules, held, durationMin, bufferMin, leadMs) => {
        const notBefore = new Date(from.getTime() + leadMs);
        const slots = freeSlots({ timeZone: "Europe/London", rules, closed: [], busy: held, durationMin, bufferMin, from, to, notBefore });
        for (const s of slots) {
          expect(s.end.getTime() - s.start.getTime()).toBe(durationMin * 60_000);
          expect(s.blockedUntil.getTime() - s.end.getTime()).toBe(bufferMin * 60_000);
          expect(s.start >= from && s.start < to && s.start >= notBefore).toBe(true);
          for (const b of held.filter((h) => h.fitterUserId === s.fitterUserId)) {
            expect(s.start < b.blockedUntil && b.start < s.blockedUntil).toBe(false);
          }
        }
        for (const f of fitters) {
          const mine = slots.filter((s) => s.fitterUserId === f);
          for (let i = 1; i < mine.length; i++) expect(mine[i]!.start >= mine[i - 1]!.blockedUntil).toBe(true);
        }
      },
    ), { numRuns: 200 });
  }, 60_000); // 200 runs take 5–14 s on a busy 2-core machine: the 5 s default timed out
});
