import "server-only";
import { and, eq, isNull } from "drizzle-orm";
import { getServerSession } from "next-auth";
import { headers } from "next/headers";
import { db, schema } from "@/db";
import type { Actor } from "@/lib/access/policy";
import { authOptions } from "./options";
import { hashToken } from "./tokens";

export type SignedInActor = Actor & { name: string; email: string; via: "session" | "token" };

async function loadActor(userId: string, via: SignedInActor["via"], sessionVersion?: number): Promise<SignedInActor | null> {
  const [row] = await db
    .select({ user: schema.users, golferId: schema.golfers.id })
    .from(schema.users)
    .leftJoin(schema.golfers, eq(schema.golfers.userId, schema.users.id))
    .where(eq(schema.users.id, userId));
  if (!row || row.user.disabled) return null;
  // A role change, a disable or a new password bumps the version: older sessions end at once.
  if (sessionVersion !== undefined && row.user.sessionVersion !== sessionVersion) return null;
  const { user } = row;
  return { userId: user.id, role: user.role, studioId: user.studioId, golferId: row.golferId, name: user.name, email: user.email, via };
}

async function actorFromBearer(authorization: string): Promise<SignedInActor | null> {
  const value = authorization.slice("bearer ".length).trim();
  if (!value) return null;
  const [token] = await db
    .select({ id: schema.apiTokens.id, userId: schema.apiTokens.userId, lastUsedAt: schema.apiTokens.lastUsedAt })
    .from(schema.apiTokens)
    .where(and(eq(schema.apiTokens.tokenHash, hashToken(value)), isNull(schema.apiTokens.revokedAt)));
  if (!token) return null;
  // "Last used" to the minute is enough; writing it on every request would serialise a busy script on one row.
  if (!token.lastUsedAt || Date.now() - token.lastUsedAt.getTime() > 60_000) {
    db.update(schema.apiTokens).set({ lastUsedAt: new Date() }).where(eq(schema.apiTokens.id, token.id)).catch((err) => console.error("token last-used update failed", err));
  }
  return loadActor(token.userId, "token");
}

/** The signed-in person for this request (Bearer token or browser session), checked against the database. */
export async function currentActor(): Promise<SignedInActor | null> {
  const authorization = (await headers()).get("authorization");
  if (authorization?.toLowerCase().startsWith("bearer ")) return actorFromBearer(authorization);
  const session = await getServerSession(authOptions);
  if (!session?.user?.id) return null;
  return loadActor(session.user.id, "session", session.user.sessionVersion);
}
