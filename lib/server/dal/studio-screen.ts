import "server-only";
// The studio screen: a read-only view of one fitting's session for a second monitor or TV, opened
// without signing in by a link that carries 256 random bits (only their SHA-256 is kept). A link
// works for its own fitting only, until it expires (12 hours), is replaced by a newer link, or the
// fitting is completed — so it "expires with the fitting".
import { createHash, randomBytes } from "node:crypto";
import { and, desc, eq, gt, isNull } from "drizzle-orm";
import { db, schema } from "@/db";
import { withChecks } from "@/lib/compare/build-checks";
import type { SignedInActor } from "../access";
import { fittingForWrite } from "./fittings";
import { sessionOf } from "./session";

const { studioScreenLinks, fittings, builds } = schema;

export const STUDIO_SCREEN_HOURS = 12;

const hashToken = (token: string) => createHash("sha256").update(token).digest("hex");

export const studioScreenPath = (fittingId: string, token: string) => `/screen/${fittingId}/${token}`;

/** POST /api/fittings/{id}/studio-screen: a new link (older links of the fitting stop working). */
export async function createStudioScreenLink(actor: SignedInActor, fittingId: string, now = new Date()) {
  const fitting = await fittingForWrite(actor, fittingId);
  const token = randomBytes(32).toString("base64url");
  const expiresAt = new Date(now.getTime() + STUDIO_SCREEN_HOURS * 3600_000);
  await db.transaction(async (tx) => {
    await tx.update(studioScreenLinks).set({ revokedAt: now }).where(and(eq(studioScreenLinks.fittingId, fitting.id), isNull(studioScreenLinks.revokedAt)));
    await tx.insert(studioScreenLinks).values({ studioId: fitting.studioId, fittingId: fitting.id, tokenHash: hashToken(token), expiresAt, createdBy: actor.userId });
  });
  return { path: studioScreenPath(fitting.id, token), expiresAt };
}

/** DELETE /api/fittings/{id}/studio-screen: every link of the fitting stops working now. */
export async function revokeStudioScreenLinks(actor: SignedInActor, fittingId: string) {
  const fitting = await fittingForWrite(actor, fittingId);
  const revoked = await db.update(studioScreenLinks).set({ revokedAt: new Date() })
    .where(and(eq(studioScreenLinks.fittingId, fitting.id), isNull(studioScreenLinks.revokedAt))).returning({ id: studioScreenLinks.id });
  return { revoked: revoked.length };
}

/** The newest working link's expiry, for the fitting page (the token itself is never stored). */
export async function activeStudioScreenLink(actor: SignedInActor, fittingId: string) {
  const fitting = await fittingForWrite(actor, fittingId);
  const [row] = await db.select({ expiresAt: studioScreenLinks.expiresAt }).from(studioScreenLinks)
    .where(and(eq(studioScreenLinks.fittingId, fitting.id), isNull(studioScreenLinks.revokedAt), gt(studioScreenLinks.expiresAt, new Date())))
    .orderBy(desc(studioScreenLinks.createdAt)).limit(1);
  return row ?? null;
}

export type StudioScreenRefusal = "unknown" | "other-fitting" | "expired" | "completed";

/** Why a link shows nothing, in words for the person in front of the screen. */
export const STUDIO_SCREEN_REFUSALS: Record<StudioScreenRefusal, string> = {
  unknown: "This studio-screen link is not valid. Check that the whole link was opened.",
  "other-fitting": "This studio-screen link belongs to another fitting, so it shows nothing here.",
  expired: "This studio-screen link has expired or was replaced by a newer one. Ask the fitter for a new link.",
  completed: "This fitting is completed, so its studio-screen link no longer works.",
};

/**
 * What a studio-screen link may show: the session of its own fitting, or why not. The link is the
 * only credential, so the fitting in the address must be the link's own.
 */
export async function studioScreenSession(fittingId: string, token: string, now = new Date()):
  Promise<{ ok: true; session: Awaited<ReturnType<typeof sessionOf>>; expiresAt: Date } | { ok: false; refusal: StudioScreenRefusal }> {
  if (token.length < 20 || token.length > 100) return { ok: false, refusal: "unknown" };
  const [link] = await db.select().from(studioScreenLinks).where(eq(studioScreenLinks.tokenHash, hashToken(token)));
  if (!link) return { ok: false, refusal: "unknown" };
  if (link.fittingId !== fittingId) return { ok: false, refusal: "other-fitting" };
  if (link.revokedAt !== null || link.expiresAt <= now) return { ok: false, refusal: "expired" };
  const [fitting] = await db.select().from(fittings).where(and(eq(fittings.id, link.fittingId), eq(fittings.studioId, link.studioId)));
  if (!fitting) return { ok: false, refusal: "unknown" };
  if (fitting.status === "completed") return { ok: false, refusal: "completed" };
  const buildRows = await db.select().from(builds).where(eq(builds.fittingId, fitting.id)).orderBy(builds.position);
  const session = await sessionOf({ ...fitting, builds: buildRows.map(withChecks) });
  // The screen faces the golfer: no file names from the capture computer.
  const strip = <T extends { fileName: string }>(p: T) => ({ ...p, fileName: "" });
  return {
    ok: true,
    expiresAt: link.expiresAt,
    session: { ...session, current: session.current && strip(session.current), builds: session.builds.map((b) => ({ ...b, putts: b.putts.map(strip) })) },
  };
}
