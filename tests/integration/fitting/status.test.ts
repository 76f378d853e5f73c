// A fitting's status: planned until its first clip, then in progress; issuing the spec completes it;
// staff can set it by hand.
import { eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { db, schema } from "@/db";
import { call, signIn } from "../../support/http";
import { makeWorld, PASSWORD, type World } from "../../support/world";

let w: World;
let fitter: { cookie: string };
const status = async () => (await db.select({ s: schema.fittings.status }).from(schema.fittings).where(eq(schema.fittings.id, w.own.fitting.id)))[0]!.s;

beforeAll(async () => {
  w = await makeWorld();
  fitter = { cookie: (await signIn(w.fitter.email, PASSWORD)).cookie! };
});

describe("fitting status", () => {
  it("planned → in progress with the first clip → completed when the spec is issued; settable by hand", async () => {
    expect(await status()).toBe("planned");
    const created = await call(fitter, "POST", "/api/clips", {
      fittingId: w.own.fitting.id, buildId: w.own.build.id, view: "overhead", fileName: "putt.mp4", contentType: "video/mp4", sizeBytes: 1000, consentConfirmed: true,
    });
    expect(created.status).toBe(201);
    expect(await status()).toBe("in_progress");
    const issued = await call(fitter, "POST", `/api/fittings/${w.own.fitting.id}/specs`, { buildId: w.own.build.id, sendEmail: false });
    expect(issued.status).toBe(201);
    expect(await status()).toBe("completed");
    const back = await call(fitter, "PATCH", `/api/fittings/${w.own.fitting.id}`, { status: "in_progress" });
    expect(back.status).toBe(200);
    expect(await status()).toBe("in_progress");
  });
});
