import "server-only";
import { desc, eq } from "drizzle-orm";
import { db, schema } from "@/db";
import type { SignedInActor } from "../access";
import { getGolfer } from "./golfers";

const { specs } = schema;

/** A golfer's specs, the current one first (older ones are kept as history). */
export async function listSpecsOfGolfer(actor: SignedInActor, golferId: string) {
  await getGolfer(actor, golferId);
  return db.select().from(specs).where(eq(specs.golferId, golferId)).orderBy(desc(specs.issuedAt));
}
