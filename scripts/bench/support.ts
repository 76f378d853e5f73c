// Data for a benchmark run, made straight in the bench database: a studio, a fitter with a
// token, a golfer with a fitting and a build. Invented names; removed with the database.
import { createHash, randomBytes } from "node:crypto";
import { db, schema } from "@/db";

export async function benchStudio() {
  const tag = randomBytes(4).toString("hex");
  const settings = { units: "ft" as const, frictionMu: 0.2, windows: {}, cameraFps: { overhead: 240, "face-on": 240, "down-the-line": 240 } };
  const [studio] = await db.insert(schema.studios).values({ name: `Bench ${tag}`, slug: `bench-${tag}`, settings }).returning();
  const [fitter] = await db.insert(schema.users).values({ studioId: studio!.id, role: "fitter", email: `bench.${tag}@bench.fitframe`, name: "Bench fitter" }).returning();
  const token = `ff_bench_${randomBytes(16).toString("hex")}`;
  await db.insert(schema.apiTokens).values({ userId: fitter!.id, name: "bench", tokenHash: createHash("sha256").update(token).digest("hex") });
  const [golfer] = await db.insert(schema.golfers).values({ studioId: studio!.id, name: "Bench golfer" }).returning();
  const [fitting] = await db.insert(schema.fittings).values({ studioId: studio!.id, golferId: golfer!.id, scheduledAt: new Date(), consentConfirmedAt: new Date() }).returning();
  const [build] = await db.insert(schema.builds).values({ studioId: studio!.id, fittingId: fitting!.id, position: 1, label: "Bench build" }).returning();
  return { studio: studio!, fitter: fitter!, token, golfer: golfer!, fitting: fitting!, build: build! };
}

export const baseUrl = () => process.env.BENCH_BASE_URL ?? "http://127.0.0.1:3000";

export function percentile(sorted: number[], p: number): number {
  return sorted[Math.min(sorted.length - 1, Math.floor((p / 100) * sorted.length))]!;
}
