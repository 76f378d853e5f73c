// The golfer-data permissions (export, erase) in the one table of rules.
import { describe, expect, it } from "vitest";
import { decideGolfer, type Actor, type Role } from "@/lib/access/policy";

const actor = (role: Role, golferId: string | null = null): Actor => ({ userId: "u", role, studioId: "s1", golferId });
const own = { studioId: "s1", golferId: "g1", sharedWithCoach: true };
const otherStudio = { studioId: "s2", golferId: "g9", sharedWithCoach: false };

describe("golfer data: export and erase", () => {
  it.each([
    ["admin", "allow", "allow"],
    ["fitter", "allow", "forbidden"],
    ["coach", "forbidden", "forbidden"],
  ] as const)("%s: export %s, erase %s", (role, exp, erase) => {
    expect(decideGolfer(actor(role), "golfer.export", own)).toBe(exp);
    expect(decideGolfer(actor(role), "golfer.erase", own)).toBe(erase);
  });
  it("a golfer may export and erase its own data, never another's", () => {
    expect(decideGolfer(actor("golfer", "g1"), "golfer.export", own)).toBe("allow");
    expect(decideGolfer(actor("golfer", "g1"), "golfer.erase", own)).toBe("allow");
    expect(decideGolfer(actor("golfer", "g2"), "golfer.erase", own)).toBe("not_found");
  });
  it("another studio's golfer is not found", () => {
    expect(decideGolfer(actor("admin"), "golfer.erase", otherStudio)).toBe("not_found");
  });
});
