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
    .update(schema.apiTokens)
    .set({ lastUsedAt: new Date() })
    .where(and(eq(schema.apiTokens.tokenHash, hashToken(value)), isNull(schema.apiTokens.revokedAt)))
    .returning({ userId: schema.apiTokens.userId });
  return token ? loadActor(token.userId, "token") : null;
}

/** The signed-in person for this request (Bearer token or browser session), checked against the database. */
export async function currentActor(): Promise<SignedInActor | null> {
  const authorization = (await headers()).get("authorization");
  if (authorization?.toLowerCase().startsWith("bearer ")) return actorFromBearer(authorization);
  const session = await getServerSession(authOptions);
  if (!session?.user?.id) return null;
  return loadActor(session.user.id, "session", session.user.sessionVersion);
}
