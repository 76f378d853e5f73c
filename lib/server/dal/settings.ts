import "server-only";
import { eq } from "drizzle-orm";
import { db, schema } from "@/db";
import type { StudioSettings } from "@/db/schema";
import type { StudioSettingsInput } from "@/lib/schemas/settings";
import { changeMeasureInput, clipsMeasuredWith } from "./measure-inputs";
import { assertStudio, type SignedInActor } from "../access";

const { studios } = schema;

/** A studio's settings for the server's own use (windows for a comparison, units for a spec). */
export async function settingsOfStudio(studioId: string): Promise<StudioSettings> {
  const [row] = await db.select({ settings: studios.settings }).from(studios).where(eq(studios.id, studioId));
  return row!.settings;
}

/** The settings page and API: admins only. */
export async function getStudioSettings(actor: SignedInActor) {
  assertStudio(actor, "studio.settings");
  return settingsOfStudio(actor.studioId);
}

export async function updateStudioSettings(actor: SignedInActor, input: StudioSettingsInput) {
  assertStudio(actor, "studio.settings");
  const before = await settingsOfStudio(actor.studioId);
  // Friction enters every face-on clip's skid: those are recomputed with the new value.
  const frictionChanged = before.frictionMu !== input.frictionMu;
  return changeMeasureInput(async (tx) => {
    const [row] = await tx.update(studios).set({ settings: input, updatedAt: new Date() }).where(eq(studios.id, actor.studioId)).returning({ settings: studios.settings });
    return row!.settings;
  }, frictionChanged ? clipsMeasuredWith.studioFriction(actor.studioId) : null, actor.userId);
}
