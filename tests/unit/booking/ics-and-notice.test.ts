// The .ics we attach, read back field by field (RFC 5545: CRLF lines, VCALENDAR/VEVENT,
// DTSTART in UTC form "yyyymmddThhmmssZ" per §3.3.5), and the studio's notice rule.
import { describe, expect, it } from "vitest";
import { visitCalendar } from "@/lib/booking/ics";
import { refundOnCancel, withinNotice } from "@/lib/booking/notice";
import { icsProperties, icsUtc, icsValue } from "./ics-fields";

const visit = {
  bookingId: "7d1c2a4e-0000-4000-8000-000000000001", studioName: "Larchfield Putting Rooms", fittingTypeName: "Full putter fitting",
  fitterName: "Ada Reyes", start: new Date("2026-10-25T09:00:00Z"), end: new Date("2026-10-25T10:00:00Z"),
};

describe("visit calendar file", () => {
  it("is one VEVENT with UTC times, summary and a stable UID", () => {
    const text = visitCalendar({ ...visit, method: "request" });
    const props = icsProperties(text);
    expect(props[0]).toMatchObject({ name: "BEGIN", value: "VCALENDAR" });
    expect(props.at(-1)).toMatchObject({ name: "END", value: "VCALENDAR" });
    expect(props.filter((p) => p.name === "BEGIN" && p.value === "VEVENT")).toHaveLength(1);
    expect(icsValue(text, "VERSION")).toBe("2.0");
    expect(icsValue(text, "METHOD")).toBe("REQUEST");
    expect(icsUtc(icsValue(text, "DTSTART"))?.toISOString()).toBe("2026-10-25T09:00:00.000Z");
    expect(icsUtc(icsValue(text, "DTEND"))?.toISOString()).toBe("2026-10-25T10:00:00.000Z");
    expect(icsValue(text, "SUMMARY")).toBe("Full putter fitting at Larchfield Putting Rooms");
    // RFC 5545 §3.8.4.7: a globally unique id, the same for every message about this visit.
    expect(icsValue(text, "UID")).toBe("booking-7d1c2a4e-0000-4000-8000-000000000001@fitframe");
    expect(text.split("\r\n").every((line) => Buffer.byteLength(line) <= 75)).toBe(true); // §3.1 line length
  });
  it("a cancellation keeps the UID and says CANCEL", () => {
    const text = visitCalendar({ ...visit, method: "cancel" });
    expect(icsValue(text, "METHOD")).toBe("CANCEL");
    expect(icsValue(text, "STATUS")).toBe("CANCELLED");
    expect(icsValue(text, "UID")).toBe("booking-7d1c2a4e-0000-4000-8000-000000000001@fitframe");
  });
});

describe("notice rule", () => {
  const start = new Date("2026-12-10T10:00:00Z");
  it("48 hours' notice: exactly 48 h before is inside, a minute later is not", () => {
    expect(withinNotice(start, new Date("2026-12-08T10:00:00Z"), 48)).toBe(true);
    expect(withinNotice(start, new Date("2026-12-08T10:01:00Z"), 48)).toBe(false);
  });
  it("staff always refund; a golfer only inside the rule", () => {
    const late = new Date("2026-12-10T09:00:00Z");
    expect(refundOnCancel("staff", start, late, 48)).toBe(true);
    expect(refundOnCancel("golfer", start, late, 48)).toBe(false);
    expect(refundOnCancel("golfer", start, new Date("2026-12-01T09:00:00Z"), 48)).toBe(true);
  });
});
