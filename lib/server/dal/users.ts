import "server-only";
import { and, asc, eq, sql } from "drizzle-orm";
import { db, schema } from "@/db";
import type { Role } from "@/lib/access/policy";
import { assertStudio, type SignedInActor } from "../access";
import { ApiError, notFound } from "../http/errors";

const { users } = schema;
const publicColumns = { id: users.id, email: users.email, name: users.name, role: users.role, disabled: users.disabled };

export async function listStudioUsers(actor: SignedInActor) {
  assertStudio(actor, "users.manage");
  return db.select(publicColumns).from(users).where(eq(users.studioId, actor.studioId)).orderBy(asc(users.role), asc(users.name));
}

/** A role change or a disable bumps the session version, so it takes effect on the next request. */
export async function updateStudioUser(actor: SignedInActor, id: string, change: { role?: Role; disabled?: boolean }) {
  assertStudio(actor, "users.manage");
  if (id === actor.userId && (change.disabled || (change.role && change.role !== actor.role))) {
    throw new ApiError("unprocessable", "You cannot change your own role or disable your own account");
  }
  const [row] = await db
    .update(users)
    .set({ ...change, sessionVersion: sql`${users.sessionVersion} + 1`, updatedAt: new Date() })
    .where(and(eq(users.id, id), eq(users.studioId, actor.studioId)))
    .returning(publicColumns);
  if (!row) throw notFound("No such user");
  return row;
}
