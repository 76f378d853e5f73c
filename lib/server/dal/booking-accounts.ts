import "server-only";
// A golfer creates its own account on a studio's booking page (no sign-in yet), then signs in.
import type { z } from "zod";
import { db, schema } from "@/db";
import type { golferAccountSchema } from "@/lib/booking/schemas";
import { hashPassword } from "../auth/password";
import { assertSignupAllowed, recordSignup } from "../auth/signup-limit";
import { ApiError } from "../http/errors";
import { pgErrorCode } from "../pg-errors";
import { studioBySlug } from "./booking-slots";

const { users, golfers } = schema;

/** `ip`: the client's address, for the per-network cap on new accounts (auth/signup-limit.ts). */
export async function createGolferAccount(slug: string, input: z.infer<typeof golferAccountSchema>, ip: string) {
  const studio = await studioBySlug(slug);
  await assertSignupAllowed(ip);
  const passwordHash = await hashPassword(input.password);
  try {
    const account = await db.transaction(async (tx) => {
      const [user] = await tx.insert(users).values({ studioId: studio.id, role: "golfer", email: input.email, name: input.name, passwordHash }).returning();
      const [golfer] = await tx.insert(golfers).values({ studioId: studio.id, userId: user!.id, name: input.name, email: input.email, handedness: input.handedness }).returning();
      return { userId: user!.id, golferId: golfer!.id, email: user!.email };
    });
    await recordSignup(ip);
    return account;
  } catch (err) {
    if (pgErrorCode(err) === "23505") throw new ApiError("conflict", "An account with this e-mail already exists. Sign in instead.");
    throw err;
  }
}

