// Who may do what: the one table of rules. Pure (no I/O); lib/server/access.ts loads the
// facts (the subject's studio and golfer, a coach's shares) and calls decide().
export type Role = "admin" | "fitter" | "coach" | "golfer";

export type Actor = {
  userId: string;
  role: Role;
  studioId: string;
  golferId: string | null;
};

/** Studio-level permissions need no subject; golfer-level ones act on one golfer's data. */
export type StudioPermission = "golfers.list" | "golfers.create" | "users.manage" | "studio.settings" | "tokens.manage";
export type GolferPermission = "golfer.read" | "golfer.write" | "golfer.comment";
export type Permission = StudioPermission | GolferPermission;

/** The data a golfer-level check is about: its studio, its golfer, whether a coach was given it. */
export type Subject = { studioId: string; golferId: string; sharedWithCoach: boolean };

/** `not_found` when the actor may not even know the thing exists (another studio's, another golfer's). */
export type Decision = "allow" | "forbidden" | "not_found";

const studioRules: Record<StudioPermission, readonly Role[]> = {
  "golfers.list": ["admin", "fitter", "coach"],
  "golfers.create": ["admin", "fitter"],
  "users.manage": ["admin"],
  "studio.settings": ["admin"],
  "tokens.manage": ["admin", "fitter"],
};

export function decideStudio(actor: Actor, permission: StudioPermission): Decision {
  return studioRules[permission].includes(actor.role) ? "allow" : "forbidden";
}

function canSee(actor: Actor, subject: Subject): boolean {
  switch (actor.role) {
    case "admin":
    case "fitter":
      return actor.studioId === subject.studioId;
    case "coach":
      return subject.sharedWithCoach;
    case "golfer":
      return actor.golferId !== null && actor.golferId === subject.golferId;
  }
}

export function decideGolfer(actor: Actor, permission: GolferPermission, subject: Subject): Decision {
  if (!canSee(actor, subject)) return "not_found";
  if (permission === "golfer.read") return "allow";
  if (permission === "golfer.comment") return "allow";
  // golfer.write: the studio's staff who run fittings.
  return actor.role === "admin" || actor.role === "fitter" ? "allow" : "forbidden";
}
