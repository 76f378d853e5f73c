import "server-only";
import { and, eq, max } from "drizzle-orm";
import type { z } from "zod";
import { db, schema } from "@/db";
import type { buildFieldsSchema, buildUpdateSchema } from "@/lib/schemas/fitting";
import type { SignedInActor } from "../access";
import { notFound } from "../http/errors";
import { fittingForWrite } from "./fittings";

const { builds } = schema;

export async function createBuild(actor: SignedInActor, fittingId: string, input: z.infer<typeof buildFieldsSchema>) {
  const fitting = await fittingForWrite(actor, fittingId);
  return db.transaction(async (tx) => {
    const [last] = await tx.select({ n: max(builds.position) }).from(builds).where(eq(builds.fittingId, fittingId));
    const [row] = await tx
      .insert(builds)
      .values({ ...input, fittingId, studioId: fitting.studioId, position: (last?.n ?? 0) + 1 })
      .returning();
    return row!;
  });
}

export async function updateBuild(actor: SignedInActor, id: string, input: z.infer<typeof buildUpdateSchema>) {
  const [current] = await db.select().from(builds).where(eq(builds.id, id));
  if (!current) throw notFound("No such build");
  await fittingForWrite(actor, current.fittingId);
  const [row] = await db
    .update(builds)
    .set({ ...input, updatedAt: new Date() })
    .where(and(eq(builds.id, id), eq(builds.studioId, current.studioId)))
    .returning();
  return row!;
}
