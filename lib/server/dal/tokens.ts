import "server-only";
import { and, desc, eq, isNull } from "drizzle-orm";
import { db, schema } from "@/db";
import { assertStudio, type SignedInActor } from "../access";
import { hashToken, newTokenValue } from "../auth/tokens";
import { notFound } from "../http/errors";

const { apiTokens } = schema;

/** A personal token for scripts (the capture computer). The value is returned once, never stored. */
export async function createToken(actor: SignedInActor, name: string) {
  assertStudio(actor, "tokens.manage");
  const value = newTokenValue();
  const [row] = await db
    .insert(apiTokens)
    .values({ userId: actor.userId, name, tokenHash: hashToken(value) })
    .returning({ id: apiTokens.id, name: apiTokens.name, createdAt: apiTokens.createdAt });
  return { ...row!, token: value };
}

export async function listTokens(actor: SignedInActor) {
  assertStudio(actor, "tokens.manage");
  return db
    .select({ id: apiTokens.id, name: apiTokens.name, createdAt: apiTokens.createdAt, lastUsedAt: apiTokens.lastUsedAt })
    .from(apiTokens)
    .where(and(eq(apiTokens.userId, actor.userId), isNull(apiTokens.revokedAt)))
    .orderBy(desc(apiTokens.createdAt));
}

export async function revokeToken(actor: SignedInActor, id: string) {
  assertStudio(actor, "tokens.manage");
  const [row] = await db
    .update(apiTokens)
    .set({ revokedAt: new Date() })
    .where(and(eq(apiTokens.id, id), eq(apiTokens.userId, actor.userId), isNull(apiTokens.revokedAt)))
    .returning({ id: apiTokens.id });
  if (!row) throw notFound("No such token");
}
