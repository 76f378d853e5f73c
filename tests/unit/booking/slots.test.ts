// Slot arithmetic against hand-worked cases. Time-zone rules: the IANA tz database, read by
// luxon through Intl (Node 20's ICU). UK clocks go forward at 01:00 UTC on the last Sunday of
// March and back at 01:00 UTC on the last Sunday of October; US Eastern clocks go forward on
// the second Sunday of March at 02:00 local (IANA tz database, Europe/London and America/New_York).
import { describe, expect, it } from "vitest";
import { formatClock, freeSlots, localDays, localToUtc, parseClock, type SlotQuery } from "@/lib/booking/slots";

const F = "fitter-1";
const G = "fitter-2";
const iso = (d: Date) => d.toISOString().replace(".000", "");
const at = (s: string) => new Date(s);

function query(over: Partial<SlotQuery>): SlotQuery {
  return {
    timeZone: "Europe/London", rules: [], closed: [], busy: [], durationMin: 60, bufferMin: 0,
    from: at("2026-03-27T00:00:00Z"), to: at("2026-04-01T00:00:00Z"), notBefore: at("2026-01-01T00:00:00Z"), ...over,
  };
}
const starts = (q: SlotQuery) => freeSlots(q).map((s) => iso(s.start));

describe("local wall clock to UTC (IANA tz database via luxon)", () => {
  it("09:00 in London is 09:00Z in winter and 08:00Z in summer", () => {
    expect(iso(localToUtc("2026-03-28", 540, "Europe/London"))).toBe("2026-03-28T09:00:00Z");
    expect(iso(localToUtc("2026-03-29", 540, "Europe/London"))).toBe("2026-03-29T08:00:00Z");
    expect(iso(localToUtc("2026-10-24", 540, "Europe/London"))).toBe("2026-10-24T08:00:00Z");
    expect(iso(localToUtc("2026-10-25", 540, "Europe/London"))).toBe("2026-10-25T09:00:00Z");
  });
  it("a time inside the spring-forward gap moves forward with the clock", () => {
    // 01:30 does not exist in London on 29 March 2026; the clock reads 02:30 BST = 01:30Z.
    expect(iso(localToUtc("2026-03-29", 90, "Europe/London"))).toBe("2026-03-29T01:30:00Z");
  });
  it("New York: 09:00 is 14:00Z before and 13:00Z after 8 March 2026", () => {
    expect(iso(localToUtc("2026-03-07", 540, "America/New_York"))).toBe("2026-03-07T14:00:00Z");
    expect(iso(localToUtc("2026-03-08", 540, "America/New_York"))).toBe("2026-03-08T13:00:00Z");
  });
  it("24:00 is the next local midnight", () => {
    expect(iso(localToUtc("2026-03-28", 1440, "Europe/London"))).toBe("2026-03-29T00:00:00Z");
  });
});

describe("free slots", () => {
  it("Saturday and Sunday 09:00–12:00 around the spring change keep local times", () => {
    const rules = [6, 7].map((weekday) => ({ fitterUserId: F, weekday, startMinute: 540, endMinute: 720 }));
    expect(starts(query({ rules }))).toEqual([
      "2026-03-28T09:00:00Z", "2026-03-28T10:00:00Z", "2026-03-28T11:00:00Z",
      "2026-03-29T08:00:00Z", "2026-03-29T09:00:00Z", "2026-03-29T10:00:00Z",
    ]);
  });

  it("a window over the spring-forward night is one hour short: 00:00–04:00 holds three hours", () => {
    const rules = [{ fitterUserId: F, weekday: 7, startMinute: 0, endMinute: 240 }];
    // 00:00 GMT = 00:00Z; 04:00 BST = 03:00Z → starts 00:00Z, 01:00Z (02:00 BST), 02:00Z (03:00 BST).
    expect(starts(query({ rules }))).toEqual(["2026-03-29T00:00:00Z", "2026-03-29T01:00:00Z", "2026-03-29T02:00:00Z"]);
  });

  it("a window over the autumn night is one hour long: 00:00–04:00 holds five hours", () => {
    const rules = [{ fitterUserId: F, weekday: 7, startMinute: 0, endMinute: 240 }];
    const q = query({ rules, from: at("2026-10-24T00:00:00Z"), to: at("2026-10-26T00:00:00Z") });
    // 00:00 BST = 23:00Z on the 24th; 04:00 GMT = 04:00Z; 01:00 local happens twice (00:00Z BST, 01:00Z GMT).
    expect(starts(q)).toEqual([
      "2026-10-24T23:00:00Z", "2026-10-25T00:00:00Z", "2026-10-25T01:00:00Z", "2026-10-25T02:00:00Z", "2026-10-25T03:00:00Z",
    ]);
  });

  it("steps by duration plus buffer; the fitting must end inside the window, the buffer may not", () => {
    const rules = [{ fitterUserId: F, weekday: 2, startMinute: 540, endMinute: 720 }];
    const q = query({ rules, durationMin: 50, bufferMin: 15, from: at("2026-12-01T00:00:00Z"), to: at("2026-12-02T00:00:00Z") });
    // 09:00, 10:05, 11:10 (ends 12:00, buffer to 12:15); a fourth at 12:15 would not fit.
    expect(starts(q)).toEqual(["2026-12-01T09:00:00Z", "2026-12-01T10:05:00Z", "2026-12-01T11:10:00Z"]);
    expect(iso(freeSlots(q)[2]!.blockedUntil)).toBe("2026-12-01T12:15:00Z");
  });

  it("leaves out busy spans, closed days, the lead time and other fitters' diaries", () => {
    const rules = [
      { fitterUserId: F, weekday: 2, startMinute: 540, endMinute: 720 },
      { fitterUserId: G, weekday: 2, startMinute: 540, endMinute: 660 },
      { fitterUserId: F, weekday: 3, startMinute: 540, endMinute: 600 },
    ];
    const base = { rules, from: at("2026-12-01T00:00:00Z"), to: at("2026-12-03T00:00:00Z") };
    // F holds 10:30–11:00 (buffer to 11:15): it overlaps both the 10:00 and 11:00 slots of F only.
    const busy = [{ fitterUserId: F, start: at("2026-12-01T10:30:00Z"), blockedUntil: at("2026-12-01T11:15:00Z") }];
    const q = query({ ...base, busy });
    expect(freeSlots(q).map((s) => `${s.fitterUserId} ${iso(s.start)}`)).toEqual([
      "fitter-1 2026-12-01T09:00:00Z", "fitter-2 2026-12-01T09:00:00Z", "fitter-2 2026-12-01T10:00:00Z", "fitter-1 2026-12-02T09:00:00Z",
    ]);
    expect(starts(query({ ...base, closed: [{ fitterUserId: null, day: "2026-12-01" }] }))).toEqual(["2026-12-02T09:00:00Z"]);
    expect(freeSlots(query({ ...base, closed: [{ fitterUserId: G, day: "2026-12-01" }] })).filter((s) => s.fitterUserId === G)).toEqual([]);
    expect(starts(query({ ...base, notBefore: at("2026-12-01T10:30:00Z") }))).toEqual([
      "2026-12-01T11:00:00Z", "2026-12-02T09:00:00Z",
    ]);
  });

  it("local days follow the studio's zone, not UTC", () => {
    // 23:30Z on 28 March is still the 28th in London (GMT); 23:30Z on 29 March is the 30th (BST).
    expect(localDays(at("2026-03-28T23:30:00Z"), at("2026-03-29T23:30:01Z"), "Europe/London")).toEqual(["2026-03-28", "2026-03-29", "2026-03-30"]);
  });
});

describe("clock times", () => {
  it("parses and formats HH:MM", () => {
    expect(parseClock("09:30")).toBe(570);
    expect(parseClock("24:00")).toBe(1440);
    expect(() => parseClock("9:30")).toThrow();
    expect(() => parseClock("24:30")).toThrow();
    expect(formatClock(570)).toBe("09:30");
  });
});

describe("overlapping opening windows", () => {
  it("offer each moment once: 09:00–11:00 and 10:30–12:30 give 09:00, 10:00, 11:00 … not 10:30", () => {
    const rules = [
      { fitterUserId: F, weekday: 2, startMinute: 540, endMinute: 660 },
      { fitterUserId: F, weekday: 2, startMinute: 630, endMinute: 750 },
    ];
    const q = query({ rules, from: at("2026-12-01T00:00:00Z"), to: at("2026-12-02T00:00:00Z") });
    // Candidates 09:00, 10:00 (first window), 10:30, 11:30 (second); 10:30 clashes with 10:00, 11:30 follows 10:00's end at 11:00.
    expect(starts(q)).toEqual(["2026-12-01T09:00:00Z", "2026-12-01T10:00:00Z", "2026-12-01T11:30:00Z"]);
  });
});
