// Builds a test world straight in the test database: two studios, every role, golfers
// (one shared with the coach), fittings and builds. Each call uses fresh e-mails.
import { createHash, randomBytes } from "node:crypto";
import bcrypt from "bcryptjs";
import { db, schema } from "@/db";

export const PASSWORD = "correct horse battery";
const passwordHash = bcrypt.hashSync(PASSWORD, 4);

type Role = "admin" | "fitter" | "coach" | "golfer";

async function user(studioId: string, role: Role, tag: string, label: string) {
  const [row] = await db
    .insert(schema.users)
    .values({ studioId, role, email: `${label}.${tag}@test.fitframe`, name: `${label} ${tag}`, passwordHash })
    .returning();
  return row!;
}

async function golferWithFitting(studioId: string, tag: string, label: string) {
  const account = await user(studioId, "golfer", tag, label);
  const [golfer] = await db
    .insert(schema.golfers)
    .values({ studioId, userId: account.id, name: `${label} ${tag}`, email: account.email })
    .returning();
  const [fitting] = await db.insert(schema.fittings).values({ studioId, golferId: golfer!.id, scheduledAt: new Date() }).returning();
  const [build] = await db.insert(schema.builds).values({ studioId, fittingId: fitting!.id, position: 1, label: "Baseline" }).returning();
  return { account, golfer: golfer!, fitting: fitting!, build: build! };
}

export async function tokenFor(userId: string) {
  const value = `ff_test_${randomBytes(16).toString("hex")}`;
  const [row] = await db
    .insert(schema.apiTokens)
    .values({ userId, name: "test", tokenHash: createHash("sha256").update(value).digest("hex") })
    .returning();
  return { id: row!.id, value };
}

export async function makeWorld() {
  const tag = randomBytes(4).toString("hex");
  const settings = { units: "ft" as const, frictionMu: 0.2, windows: {}, cameraFps: { overhead: 240, "face-on": 240, "down-the-line": 240 } };
  const [a] = await db.insert(schema.studios).values({ name: `Studio A ${tag}`, slug: `a-${tag}`, settings }).returning();
  const [b] = await db.insert(schema.studios).values({ name: `Studio B ${tag}`, slug: `b-${tag}`, settings }).returning();
  const admin = await user(a!.id, "admin", tag, "admin");
  const fitter = await user(a!.id, "fitter", tag, "fitter");
  const fitter2 = await user(a!.id, "fitter", tag, "fitter2");
  const coach = await user(a!.id, "coach", tag, "coach");
  const own = await golferWithFitting(a!.id, tag, "golfer");
  const sibling = await golferWithFitting(a!.id, tag, "sibling");
  await db.insert(schema.coachGolfers).values({ coachUserId: coach.id, golferId: own.golfer.id });
  const otherAdmin = await user(b!.id, "admin", tag, "other-admin");
  const other = await golferWithFitting(b!.id, tag, "other");
  return { tag, studioA: a!, studioB: b!, admin, fitter, fitter2, coach, own, sibling, otherAdmin, other };
}

export type World = Awaited<ReturnType<typeof makeWorld>>;
