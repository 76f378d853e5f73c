import "server-only";
import { and, eq, max } from "drizzle-orm";
import type { z } from "zod";
import { db, schema } from "@/db";
import { withChecks } from "@/lib/compare/build-checks";
import type { buildDuplicateSchema, buildFieldsSchema, buildUpdateSchema } from "@/lib/schemas/fitting";
import type { SignedInActor } from "../access";
import { notFound } from "../http/errors";
import { fittingForWrite } from "./fittings";
import { changeMeasureInput, clipsMeasuredWith } from "./measure-inputs";

const { builds } = schema;

async function insertAtEnd(fittingId: string, studioId: string, values: z.infer<typeof buildFieldsSchema>) {
  return db.transaction(async (tx) => {
    const [last] = await tx.select({ n: max(builds.position) }).from(builds).where(eq(builds.fittingId, fittingId));
    const [row] = await tx.insert(builds).values({ ...values, fittingId, studioId, position: (last?.n ?? 0) + 1 }).returning();
    return withChecks(row!);
  });
}

export async function createBuild(actor: SignedInActor, fittingId: string, input: z.infer<typeof buildFieldsSchema>) {
  const fitting = await fittingForWrite(actor, fittingId);
  return insertAtEnd(fittingId, fitting.studioId, input);
}

async function buildForWrite(actor: SignedInActor, id: string) {
  const [current] = await db.select().from(builds).where(eq(builds.id, id));
  if (!current) throw notFound("No such build");
  await fittingForWrite(actor, current.fittingId);
  return current;
}

export async function updateBuild(actor: SignedInActor, id: string, input: z.infer<typeof buildUpdateSchema>) {
  const current = await buildForWrite(actor, id);
  // The static loft enters dynamic loft: the build's face-on clips are recomputed with the new one.
  const loftChanged = input.loftDeg !== undefined && input.loftDeg !== current.loftDeg;
  const row = await changeMeasureInput(async (tx) => {
    const [updated] = await tx
      .update(builds)
      .set({ ...input, updatedAt: new Date() })
      .where(and(eq(builds.id, id), eq(builds.studioId, current.studioId)))
      .returning();
    return updated!;
  }, loftChanged ? clipsMeasuredWith.build(id) : null, actor.userId);
  return withChecks(row);
}

/** A copy of a build with the given change, added at the end of the fitting (never a baseline). */
export async function duplicateBuild(actor: SignedInActor, id: string, input: z.infer<typeof buildDuplicateSchema>) {
  const current = await buildForWrite(actor, id);
  const { id: _id, studioId, fittingId, position: _p, createdAt: _c, updatedAt: _u, ...fields } = current;
  void _id; void _p; void _c; void _u;
  return insertAtEnd(fittingId, studioId, { ...fields, ...input.change, isBaseline: false, label: input.label ?? `${current.label} (copy)` });
}
