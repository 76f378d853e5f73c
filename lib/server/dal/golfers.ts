import "server-only";
import { and, asc, count, eq, ilike, inArray, or, type SQL } from "drizzle-orm";
import type { z } from "zod";
import { db, schema } from "@/db";
import type { golferCreateSchema, golferListQuery, golferUpdateSchema } from "@/lib/schemas/golfer";
import { assertGolfer, assertStudio, type SignedInActor } from "../access";
import { notFound } from "../http/errors";

const { golfers, coachGolfers } = schema;

export async function listGolfers(actor: SignedInActor, query: z.infer<typeof golferListQuery>) {
  assertStudio(actor, "golfers.list");
  const scope: SQL[] =
    actor.role === "coach"
      ? [inArray(golfers.id, db.select({ id: coachGolfers.golferId }).from(coachGolfers).where(eq(coachGolfers.coachUserId, actor.userId)))]
      : [eq(golfers.studioId, actor.studioId)];
  if (query.q) {
    const pattern = `%${query.q.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
    scope.push(or(ilike(golfers.name, pattern), ilike(golfers.email, pattern))!);
  }
  const where = and(...scope);
  const [rows, [total]] = await Promise.all([
    db.select().from(golfers).where(where).orderBy(asc(golfers.name), asc(golfers.id)).limit(query.limit).offset(query.offset),
    db.select({ n: count() }).from(golfers).where(where),
  ]);
  return { golfers: rows, total: total?.n ?? 0 };
}

export async function getGolfer(actor: SignedInActor, id: string) {
  const [row] = await db.select().from(golfers).where(eq(golfers.id, id));
  if (!row) throw notFound("No such golfer");
  await assertGolfer(actor, "golfer.read", { studioId: row.studioId, golferId: row.id }, "No such golfer");
  return row;
}

export async function createGolfer(actor: SignedInActor, input: z.infer<typeof golferCreateSchema>) {
  assertStudio(actor, "golfers.create");
  const [row] = await db.insert(golfers).values({ ...input, studioId: actor.studioId }).returning();
  return row!;
}

export async function updateGolfer(actor: SignedInActor, id: string, input: z.infer<typeof golferUpdateSchema>) {
  const current = await getGolfer(actor, id);
  await assertGolfer(actor, "golfer.write", { studioId: current.studioId, golferId: current.id });
  const [row] = await db
    .update(golfers)
    .set({ ...input, updatedAt: new Date() })
    .where(and(eq(golfers.id, id), eq(golfers.studioId, current.studioId)))
    .returning();
  return row!;
}
