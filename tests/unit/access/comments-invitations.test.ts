// Who may send invitations and resolve comment threads, in the one table of rules.
import { describe, expect, it } from "vitest";
import { decideGolfer, decideStudio, mayResolveComment, type Actor, type Role } from "@/lib/access/policy";

const actor = (role: Role, userId = "u1", golferId: string | null = null): Actor => ({ userId, role, studioId: "s1", golferId });

describe("invitations.send", () => {
  it.each([["admin", "allow"], ["fitter", "allow"], ["coach", "forbidden"], ["golfer", "forbidden"]] as const)("%s: %s", (role, expected) => {
    expect(decideStudio(actor(role), "invitations.send")).toBe(expected);
  });
});

describe("commenting and resolving", () => {
  const subject = { studioId: "s1", golferId: "g1", sharedWithCoach: true };
  it("the golfer itself and a shared coach may comment; another golfer may not know the clip exists", () => {
    expect(decideGolfer(actor("golfer", "u2", "g1"), "golfer.comment", subject)).toBe("allow");
    expect(decideGolfer(actor("coach"), "golfer.comment", subject)).toBe("allow");
    expect(decideGolfer(actor("coach"), "golfer.comment", { ...subject, sharedWithCoach: false })).toBe("not_found");
    expect(decideGolfer(actor("golfer", "u3", "g2"), "golfer.comment", subject)).toBe("not_found");
  });
  it("staff resolve any thread; others only a thread they started", () => {
    expect(mayResolveComment(actor("fitter"), "someone-else")).toBe(true);
    expect(mayResolveComment(actor("admin"), null)).toBe(true);
    expect(mayResolveComment(actor("coach", "c1"), "c1")).toBe(true);
    expect(mayResolveComment(actor("coach", "c1"), "g1")).toBe(false);
    expect(mayResolveComment(actor("golfer", "u2", "g1"), "u2")).toBe(true);
    expect(mayResolveComment(actor("golfer", "u2", "g1"), null)).toBe(false);
  });
});
