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
export type StudioPermission = "golfers.list" | "golfers.create" | "users.manage" | "studio.settings" | "tokens.manage"
  | "bookings.manage" | "invitations.send";
export type GolferPermission = "golfer.read" | "golfer.write" | "golfer.comment" | "golfer.export" | "golfer.erase" | "golfer.mark";
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
  // The studio's diary: confirm, decline, cancel or move any booking; see the week calendar.
  "bookings.manage": ["admin", "fitter"],
  // Invite a golfer or a coach by e-mail (single-use link).
  "invitations.send": ["admin", "fitter"],
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
  // The golfer's own data: the golfer itself, and the studio's staff for export; deleting it is
  // left to the golfer and the studio's admin (a coach never exports or deletes).
  if (permission === "golfer.export") return actor.role === "coach" ? "forbidden" : "allow";
  if (permission === "golfer.erase") return actor.role === "admin" || actor.role === "golfer" ? "allow" : "forbidden";
  // golfer.mark: drawing marks on clips; a shared coach may draw its own, a golfer only reads.
  if (permission === "golfer.mark") return actor.role === "golfer" ? "forbidden" : "allow";
  // golfer.write: the studio's staff who run fittings.
  return actor.role === "admin" || actor.role === "fitter" ? "allow" : "forbidden";
}

/** Changing or removing an existing mark: studio staff any mark, a coach only the marks it drew. */
export function mayChangeMark(actor: Actor, authorUserId: string | null): boolean {
  if (actor.role === "admin" || actor.role === "fitter") return true;
  return actor.role === "coach" && authorUserId === actor.userId;
}

/** Resolving (or reopening) a comment thread: studio staff any thread, others only their own comment. */
export function mayResolveComment(actor: Actor, authorUserId: string | null): boolean {
  if (actor.role === "admin" || actor.role === "fitter") return true;
  return authorUserId !== null && authorUserId === actor.userId;
}
