import "server-only";
import { and, eq, isNull, sql } from "drizzle-orm";
import { getServerSession } from "next-auth";
import { headers } from "next/headers";
import { db, schema } from "@/db";
import type { Actor } from "@/lib/access/policy";
import { authOptions } from "./options";
import { hashToken } from "./tokens";

export type SignedInActor = Actor & { name: string; email: string; via: "session" | "token" };

type UserRow = typeof schema.users.$inferSelect;

const actorColumns = { user: schema.users, golferId: schema.golfers.id };

function toActor(user: UserRow, golferId: string | null, via: SignedInActor["via"]): SignedInActor | null {
  if (user.disabled) return null;
  return { userId: user.id, role: user.role, studioId: user.studioId, golferId, name: user.name, email: user.email, via };
}

// Prepared once: every API request and page asks for its actor.
const actorByUserId = db
  .select(actorColumns)
  .from(schema.users)
  .leftJoin(schema.golfers, eq(schema.golfers.userId, schema.users.id))
  .where(eq(schema.users.id, sql.placeholder("userId")))
  .prepare("actor_by_user_id");

async function actorFromSession(userId: string, sessionVersion: number | undefined): Promise<SignedInActor | null> {
  const [row] = await actorByUserId.execute({ userId });
  if (!row) return null;
  // A role change, a disable or a new password bumps the version: older sessions end at once.
  if (sessionVersion !== undefined && row.user.sessionVersion !== sessionVersion) return null;
  return toActor(row.user, row.golferId, "session");
}

// Token, user and golfer in one query: scripts call the API in bursts and every request pays for it.
const actorByTokenHash = db
  .select({ ...actorColumns, tokenId: schema.apiTokens.id, lastUsedAt: schema.apiTokens.lastUsedAt })
  .from(schema.apiTokens)
  .innerJoin(schema.users, eq(schema.users.id, schema.apiTokens.userId))
  .leftJoin(schema.golfers, eq(schema.golfers.userId, schema.users.id))
  .where(and(eq(schema.apiTokens.tokenHash, sql.placeholder("tokenHash")), isNull(schema.apiTokens.revokedAt)))
  .prepare("actor_by_token_hash");

async function actorFromBearer(authorization: string): Promise<SignedInActor | null> {
  const value = authorization.slice("bearer ".length).trim();
  if (!value) return null;
  const [row] = await actorByTokenHash.execute({ tokenHash: hashToken(value) });
  if (!row) return null;
  // "Last used" to the minute is enough; writing it on every request would serialise a busy script on one row.
  if (!row.lastUsedAt || Date.now() - row.lastUsedAt.getTime() > 60_000) {
    db.update(schema.apiTokens).set({ lastUsedAt: new Date() }).where(eq(schema.apiTokens.id, row.tokenId)).catch((err) => console.error("token last-used update failed", err));
  }
  return toActor(row.user, row.golferId, "token");
}

/** The signed-in person for this request (Bearer token or browser session), checked against the database. */
export async function currentActor(): Promise<SignedInActor | null> {
  const authorization = (await headers()).get("authorization");
  if (authorization?.toLowerCase().startsWith("bearer ")) return actorFromBearer(authorization);
  const session = await getServerSession(authOptions);
  if (!session?.user?.id) return null;
  return actorFromSession(session.user.id, session.user.sessionVersion);
}
