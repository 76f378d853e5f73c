import "server-only";
import { and, count, eq, gt, lt } from "drizzle-orm";
import { db, schema } from "@/db";
import { ApiError } from "../http/errors";

// A family or a club may sign up several people from one network; a script may not sign up hundreds.
export const MAX_SIGNUPS_PER_IP = 10;
export const SIGNUP_WINDOW_MS = 60 * 60 * 1000;

/** 429 once this IP has made MAX_SIGNUPS_PER_IP accounts within the window (counted in PostgreSQL, so across web processes). */
export async function assertSignupAllowed(ip: string): Promise<void> {
  const since = new Date(Date.now() - SIGNUP_WINDOW_MS);
  const [row] = await db.select({ n: count() }).from(schema.publicSignups).where(and(eq(schema.publicSignups.ip, ip), gt(schema.publicSignups.at, since)));
  if ((row?.n ?? 0) >= MAX_SIGNUPS_PER_IP) {
    throw new ApiError("rate_limited", "Too many new accounts from this network in the last hour. Try again later, or ask the studio to invite you.");
  }
}

export async function recordSignup(ip: string): Promise<void> {
  await db.insert(schema.publicSignups).values({ ip });
  await db.delete(schema.publicSignups).where(lt(schema.publicSignups.at, new Date(Date.now() - 2 * SIGNUP_WINDOW_MS)));
}
