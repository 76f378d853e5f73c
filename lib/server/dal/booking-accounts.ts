import "server-only";
// A golfer creates its own account on a studio's booking page (no sign-in yet), then signs in.
import type { z } from "zod";
import { db, schema } from "@/db";
import type { golferAccountSchema } from "@/lib/booking/schemas";
import { hashPassword } from "../auth/password";
import { ApiError } from "../http/errors";
import { pgErrorCode } from "../pg-errors";
import { studioBySlug } from "./booking-slots";

const { users, golfers } = schema;

export async function createGolferAccount(slug: string, input: z.infer<typeof golferAccountSchema>) {
  const studio = await studioBySlug(slug);
  const passwordHash = await hashPassword(input.password);
  try {
    return await db.transaction(async (tx) => {
      const [user] = await tx.insert(users).values({ studioId: studio.id, role: "golfer", email: input.email, name: input.name, passwordHash }).returning();
      const [golfer] = await tx.insert(golfers).values({ studioId: studio.id, userId: user!.id, name: input.name, email: input.email, handedness: input.handedness }).returning();
      return { userId: user!.id, golferId: golfer!.id, email: user!.email };
    });
  } catch (err) {
    if (pgErrorCode(err) === "23505") throw new ApiError("conflict", "An account with this e-mail already exists. Sign in instead.");
    throw err;
  }
}

