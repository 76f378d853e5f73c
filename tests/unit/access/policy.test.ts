import { describe, expect, it } from "vitest";
import { decideGolfer, mayChangeMark, type Actor, type Role } from "@/lib/access/policy";

const studio = "studio-a";
const actor = (role: Role, golferId: string | null = null): Actor => ({ userId: `${role}-user`, role, studioId: studio, golferId });
const own = { studioId: studio, golferId: "golfer-1", sharedWithCoach: true };
const unshared = { studioId: studio, golferId: "golfer-2", sharedWithCoach: false };
const otherStudio = { studioId: "studio-b", golferId: "golfer-3", sharedWithCoach: false };

describe("golfer.mark: who may draw marks on a golfer's clips", () => {
  it("lets staff and a shared coach draw; a golfer only reads its own", () => {
    expect(decideGolfer(actor("admin"), "golfer.mark", own)).toBe("allow");
    expect(decideGolfer(actor("fitter"), "golfer.mark", unshared)).toBe("allow");
    expect(decideGolfer(actor("coach"), "golfer.mark", own)).toBe("allow");
    expect(decideGolfer(actor("golfer", "golfer-1"), "golfer.mark", own)).toBe("forbidden");
    expect(decideGolfer(actor("golfer", "golfer-1"), "golfer.read", own)).toBe("allow");
  });

  it("hides what the actor may not see", () => {
    expect(decideGolfer(actor("coach"), "golfer.mark", unshared)).toBe("not_found");
    expect(decideGolfer(actor("golfer", "golfer-1"), "golfer.mark", unshared)).toBe("not_found");
    expect(decideGolfer(actor("fitter"), "golfer.mark", otherStudio)).toBe("not_found");
  });
});

describe("mayChangeMark: editing or removing an existing mark", () => {
  it("lets staff change any mark", () => {
    expect(mayChangeMark(actor("admin"), "someone-else")).toBe(true);
    expect(mayChangeMark(actor("fitter"), null)).toBe(true);
  });

  it("lets a coach change only the marks it drew", () => {
    expect(mayChangeMark(actor("coach"), "coach-user")).toBe(true);
    expect(mayChangeMark(actor("coach"), "fitter-user")).toBe(false);
    expect(mayChangeMark(actor("coach"), null)).toBe(false);
  });

  it("never lets a golfer change a mark, not even one recorded under its name", () => {
    expect(mayChangeMark(actor("golfer", "golfer-1"), "golfer-user")).toBe(false);
  });
});
