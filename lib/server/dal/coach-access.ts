import "server-only";
// Sharing a golfer with a coach of the studio, golfer by golfer. Access is checked on every
// request (lib/server/access.ts), so a withdrawal takes effect on the coach's next request.
import { and, asc, eq } from "drizzle-orm";
import { db, schema } from "@/db";
import { assertGolfer, type SignedInActor } from "../access";
import { notFound } from "../http/errors";

const { coachGolfers, golfers, users } = schema;

async function golferForStaff(actor: SignedInActor, golferId: string, permission: "golfer.read" | "golfer.write") {
  const [golfer] = await db.select({ id: golfers.id, studioId: golfers.studioId }).from(golfers).where(eq(golfers.id, golferId));
  if (!golfer) throw notFound("No such golfer");
  await assertGolfer(actor, permission, { studioId: golfer.studioId, golferId: golfer.id }, "No such golfer");
  return golfer;
}

// GET /api/golfers/{id}/coaches: the coaches who have this golfer, and the studio's others.
export async function listCoachesOfGolfer(actor: SignedInActor, golferId: string) {
  const golfer = await golferForStaff(actor, golferId, "golfer.write");
  const rows = await db
    .select({ userId: users.id, name: users.name, email: users.email, grantedAt: coachGolfers.grantedAt })
    .from(coachGolfers)
    .innerJoin(users, eq(users.id, coachGolfers.coachUserId))
    .where(and(eq(coachGolfers.golferId, golfer.id), eq(users.studioId, golfer.studioId)))
    .orderBy(asc(users.name));
  const shared = new Set(rows.map((r) => r.userId));
  const studioCoaches = await db
    .select({ userId: users.id, name: users.name, email: users.email })
    .from(users)
    .where(and(eq(users.studioId, golfer.studioId), eq(users.role, "coach"), eq(users.disabled, false)))
    .orderBy(asc(users.name));
  return { coaches: rows, available: studioCoaches.filter((c) => !shared.has(c.userId)) };
}

// POST /api/golfers/{id}/coaches
export async function grantCoach(actor: SignedInActor, golferId: string, coachUserId: string) {
  const golfer = await golferForStaff(actor, golferId, "golfer.write");
  const [coach] = await db
    .select({ id: users.id })
    .from(users)
    .where(and(eq(users.id, coachUserId), eq(users.studioId, golfer.studioId), eq(users.role, "coach")));
  if (!coach) throw notFound("No such coach in this studio");
  await db.insert(coachGolfers).values({ coachUserId: coach.id, golferId: golfer.id }).onConflictDoNothing();
  return { granted: true, coachUserId: coach.id, golferId: golfer.id };
}

// DELETE /api/golfers/{id}/coaches/{userId}
export async function withdrawCoach(actor: SignedInActor, golferId: string, coachUserId: string) {
  const golfer = await golferForStaff(actor, golferId, "golfer.write");
  const [row] = await db
    .delete(coachGolfers)
    .where(and(eq(coachGolfers.golferId, golfer.id), eq(coachGolfers.coachUserId, coachUserId)))
    .returning({ golferId: coachGolfers.golferId });
  if (!row) throw notFound("This coach does not have this golfer");
  return { withdrawn: true };
}
