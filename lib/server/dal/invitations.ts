import "server-only";
// Invitations by e-mail: staff invite a golfer (its own account, linked to its golfer row) or a
// coach (an account in the studio). The link carries 256 random bits; only its SHA-256 is kept;
// it works once, for 7 days.
import { createHash, randomBytes } from "node:crypto";
import { and, desc, eq, gt, isNull, sql } from "drizzle-orm";
import { db, schema } from "@/db";
import { env } from "@/lib/config/env";
import { INVITATION_DAYS, type InvitationCreate } from "@/lib/schemas/invitations";
import { assertGolfer, assertStudio, type SignedInActor } from "../access";
import { hashPassword } from "../auth/password";
import { ApiError, notFound } from "../http/errors";
import { sendMail } from "../mail";

const { invitations, golfers, users, coachGolfers, studios } = schema;

export const hashInvitationToken = (token: string) => createHash("sha256").update(token).digest("hex");
const newInvitationToken = () => randomBytes(32).toString("base64url");

const listColumns = {
  id: invitations.id, email: invitations.email, name: invitations.name, role: invitations.role, golferId: invitations.golferId,
  expiresAt: invitations.expiresAt, usedAt: invitations.usedAt, createdAt: invitations.createdAt,
};

async function emailTaken(email: string): Promise<boolean> {
  const [row] = await db.select({ id: users.id }).from(users).where(eq(sql`lower(${users.email})`, email.toLowerCase()));
  return Boolean(row);
}

// POST /api/invitations
export async function createInvitation(actor: SignedInActor, input: InvitationCreate) {
  assertStudio(actor, "invitations.send");
  let golfer: typeof golfers.$inferSelect | undefined;
  if (input.golferId) {
    [golfer] = await db.select().from(golfers).where(and(eq(golfers.id, input.golferId), eq(golfers.studioId, actor.studioId)));
    if (!golfer) throw notFound("No such golfer");
    await assertGolfer(actor, "golfer.write", { studioId: golfer.studioId, golferId: golfer.id }, "No such golfer");
    if (input.role === "golfer" && golfer.userId) throw new ApiError("conflict", "This golfer already has an account");
  }
  if (await emailTaken(input.email)) throw new ApiError("conflict", "An account with this e-mail already exists");
  const token = newInvitationToken();
  const expiresAt = new Date(Date.now() + INVITATION_DAYS * 24 * 3600 * 1000);
  const name = input.name ?? golfer?.name ?? input.email;
  const [row] = await db
    .insert(invitations)
    .values({ studioId: actor.studioId, tokenHash: hashInvitationToken(token), email: input.email, name, role: input.role, golferId: golfer?.id ?? null, invitedBy: actor.userId, expiresAt })
    .returning(listColumns);
  const [studio] = await db.select({ name: studios.name }).from(studios).where(eq(studios.id, actor.studioId));
  const link = `${env().NEXTAUTH_URL}/invite/${token}`;
  const what = input.role === "golfer" ? "see your fitting's clips, measurements and spec on your phone" : `review the clips of the golfers ${studio!.name} shares with you and comment on them`;
  await sendMail({
    to: input.email,
    subject: `${studio!.name} invites you to Fitframe`,
    text: `Hello ${name},\n\n${actor.name} at ${studio!.name} invites you to ${what}.\n\nSet your password here (the link works once, for ${INVITATION_DAYS} days):\n${link}\n\nIf you did not expect this, ignore this e-mail.`,
  });
  return { invitation: row! };
}

// GET /api/invitations
export async function listInvitations(actor: SignedInActor) {
  assertStudio(actor, "invitations.send");
  const rows = await db.select(listColumns).from(invitations).where(eq(invitations.studioId, actor.studioId)).orderBy(desc(invitations.createdAt)).limit(200);
  return { invitations: rows };
}

// DELETE /api/invitations/{id}: an unused invitation stops working at once.
export async function withdrawInvitation(actor: SignedInActor, id: string) {
  assertStudio(actor, "invitations.send");
  const [row] = await db
    .delete(invitations)
    .where(and(eq(invitations.id, id), eq(invitations.studioId, actor.studioId), isNull(invitations.usedAt)))
    .returning({ id: invitations.id });
  if (!row) throw notFound("No such unused invitation");
  return { withdrawn: true };
}

export type InvitationState = "valid" | "used" | "expired" | "unknown";

async function findByToken(token: string) {
  const [row] = await db.select().from(invitations).where(eq(invitations.tokenHash, hashInvitationToken(token)));
  return row;
}

function stateOf(row: typeof invitations.$inferSelect | undefined): InvitationState {
  if (!row) return "unknown";
  if (row.usedAt) return "used";
  return row.expiresAt.getTime() <= Date.now() ? "expired" : "valid";
}

/** For the public invitation page: whether the link works, and for whom (no sign-in). */
export async function describeInvitation(token: string) {
  const row = await findByToken(token);
  const state = stateOf(row);
  return state === "valid" ? { state, email: row!.email, name: row!.name, role: row!.role } : { state };
}

const refusal: Record<Exclude<InvitationState, "valid">, ApiError> = {
  unknown: new ApiError("not_found", "This invitation link is not valid"),
  used: new ApiError("conflict", "This invitation has already been used. Sign in instead."),
  expired: new ApiError("unprocessable", "This invitation has expired. Ask the studio for a new one."),
};

// POST /api/invitations/accept (public): sets the password and creates the account, once.
export async function acceptInvitation(input: { token: string; password: string }) {
  const passwordHash = await hashPassword(input.password);
  const tokenHash = hashInvitationToken(input.token);
  return db.transaction(async (tx) => {
    // The conditional update is the single-use guard: two racing requests cannot both win.
    const [inv] = await tx
      .update(invitations)
      .set({ usedAt: new Date() })
      .where(and(eq(invitations.tokenHash, tokenHash), isNull(invitations.usedAt), gt(invitations.expiresAt, new Date())))
      .returning();
    if (!inv) {
      const state = stateOf(await findByToken(input.token));
      throw refusal[state === "valid" ? "used" : state];
    }
    const [taken] = await tx.select({ id: users.id }).from(users).where(eq(sql`lower(${users.email})`, inv.email.toLowerCase()));
    if (taken) throw new ApiError("conflict", "An account with this e-mail already exists. Sign in instead.");
    const [user] = await tx.insert(users).values({ studioId: inv.studioId, email: inv.email, name: inv.name, role: inv.role, passwordHash }).returning({ id: users.id });
    if (inv.role === "golfer") {
      const [linked] = await tx
        .update(golfers)
        .set({ userId: user!.id, email: sql`coalesce(${golfers.email}, ${inv.email})`, updatedAt: new Date() })
        .where(and(eq(golfers.id, inv.golferId!), eq(golfers.studioId, inv.studioId), isNull(golfers.userId)))
        .returning({ id: golfers.id });
      if (!linked) throw new ApiError("conflict", "This golfer already has an account. Sign in instead.");
    } else if (inv.golferId) {
      await tx.insert(coachGolfers).values({ coachUserId: user!.id, golferId: inv.golferId }).onConflictDoNothing();
    }
    await tx.update(invitations).set({ userId: user!.id }).where(eq(invitations.id, inv.id));
    return { email: inv.email, role: inv.role, home: inv.role === "golfer" ? "/me" : "/studio" };
  });
}
