// The booking permission in the one table of rules (lib/access/policy.ts).
import { describe, expect, it } from "vitest";
import { decideStudio, type Actor, type Role } from "@/lib/access/policy";

const actor = (role: Role): Actor => ({ userId: "u", role, studioId: "s", golferId: role === "golfer" ? "g" : null });

describe("bookings.manage", () => {
  it("admin and fitter run the diary; coach and golfer may not", () => {
    expect((["admin", "fitter", "coach", "golfer"] as const).map((r) => decideStudio(actor(r), "bookings.manage"))).toEqual(["allow", "allow", "forbidden", "forbidden"]);
  });
  it("booking settings stay with the admin (studio.settings)", () => {
    expect((["admin", "fitter", "coach", "golfer"] as const).map((r) => decideStudio(actor(r), "studio.settings"))).toEqual(["allow", "forbidden", "forbidden", "forbidden"]);
  });
});
