import "server-only";
import { and, count, eq, gt, lt } from "drizzle-orm";
import { db, schema } from "@/db";

export const MAX_FAILURES = 10;
export const WINDOW_MS = 15 * 60 * 1000;

/** Failed sign-ins are counted per account and IP in PostgreSQL, so every web process sees them. */
export async function isSignInLimited(email: string, ip: string): Promise<boolean> {
  const since = new Date(Date.now() - WINDOW_MS);
  const [row] = await db
    .select({ n: count() })
    .from(schema.signInFailures)
    .where(and(eq(schema.signInFailures.email, email), eq(schema.signInFailures.ip, ip), gt(schema.signInFailures.at, since)));
  return (row?.n ?? 0) >= MAX_FAILURES;
}

export async function recordSignInFailure(email: string, ip: string, reason: string): Promise<void> {
  await db.insert(schema.signInFailures).values({ email, ip });
  await db.delete(schema.signInFailures).where(lt(schema.signInFailures.at, new Date(Date.now() - 2 * WINDOW_MS)));
  // Never the password; the e-mail is what the person typed, for the studio's security log.
  console.warn(JSON.stringify({ event: "sign_in_failed", email, ip, reason, at: new Date().toISOString() }));
}

export function clientIp(headers: Headers | Record<string, string | string[] | undefined>): string {
  const get = (name: string) =>
    headers instanceof Headers ? headers.get(name) : ([] as (string | undefined)[]).concat(headers[name]).at(0) ?? null;
  return get("x-forwarded-for")?.split(",")[0]?.trim() || get("x-real-ip") || "local";
}
