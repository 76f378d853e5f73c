import "server-only";
import { and, eq } from "drizzle-orm";
import { db, schema } from "@/db";
import { decideGolfer, decideStudio, type GolferPermission, type StudioPermission } from "@/lib/access/policy";
import type { SignedInActor } from "./auth/actor";
import { forbidden, notFound } from "./http/errors";

export type { SignedInActor };

export function assertStudio(actor: SignedInActor, permission: StudioPermission): void {
  if (decideStudio(actor, permission) !== "allow") throw forbidden();
}

async function isSharedWithCoach(actor: SignedInActor, golferId: string): Promise<boolean> {
  if (actor.role !== "coach") return false;
  const [row] = await db
    .select({ golferId: schema.coachGolfers.golferId })
    .from(schema.coachGolfers)
    .where(and(eq(schema.coachGolfers.coachUserId, actor.userId), eq(schema.coachGolfers.golferId, golferId)));
  return Boolean(row);
}

/** Checks a golfer-level permission on data that belongs to (studioId, golferId). */
export async function assertGolfer(
  actor: SignedInActor,
  permission: GolferPermission,
  owner: { studioId: string; golferId: string },
  what = "Not found",
): Promise<void> {
  const decision = decideGolfer(actor, permission, { ...owner, sharedWithCoach: await isSharedWithCoach(actor, owner.golferId) });
  if (decision === "not_found") throw notFound(what);
  if (decision === "forbidden") throw forbidden();
}

