// The worker's hourly sweep of abandoned uploads: a clip whose file never arrived within a day is
// deleted with its files, its multipart upload aborted where the store can; anything newer or
// already arrived stays.
import { eq, inArray } from "drizzle-orm";
import { expect, it } from "vitest";
import { db, schema } from "@/db";
import { sweepAbandonedUploads } from "@/lib/server/dal/upload-sweep";
import { clipPrefix, listKeys, putObject } from "@/lib/server/storage";
import { insertClip } from "../../support/clip-rows";
import { call } from "../../support/http";
import { makeWorld, tokenFor } from "../../support/world";

it("deletes clips still awaiting their file after a day, with their parts and files; leaves the rest", async () => {
  const w = await makeWorld();
  const auth = { token: (await tokenFor(w.fitter.id)).value };
  const register = async (fileName: string) => (await call(auth, "POST", "/api/clips", {
    fittingId: w.own.fitting.id, buildId: w.own.build.id, view: "overhead", fileName, contentType: "video/mp4", sizeBytes: 40_000_000, consentConfirmed: true,
  })).body.clip.id as string;
  const abandoned = await register("abandoned.mp4");
  expect((await call(auth, "POST", `/api/clips/${abandoned}/parts`, { partNumbers: [1] })).status).toBe(200);
  await putObject(`${clipPrefix(w.studioA.id, abandoned)}poster.jpg`, "x", "image/jpeg");
  const recent = await register("recent.mp4");
  const arrived = await insertClip(w.own);
  const dayAndMore = new Date(Date.now() - 25 * 3600_000);
  await db.update(schema.clips).set({ updatedAt: dayAndMore }).where(inArray(schema.clips.id, [abandoned, arrived.id]));

  const swept = await sweepAbandonedUploads();
  expect(swept.clips).toBeGreaterThanOrEqual(1);
  expect(await db.select().from(schema.clips).where(eq(schema.clips.id, abandoned))).toEqual([]);
  expect(await listKeys(clipPrefix(w.studioA.id, abandoned))).toEqual([]);
  expect((await db.select({ id: schema.clips.id }).from(schema.clips).where(inArray(schema.clips.id, [recent, arrived.id]))).map((r) => r.id).sort()).toEqual([recent, arrived.id].sort());
  // s3rver cannot abort a multipart upload (405): counted as unsupported, left to the bucket's lifecycle rule.
  expect(swept.multipartUploads.aborted + swept.multipartUploads.unsupported + swept.multipartUploads["not-there"]).toBeGreaterThanOrEqual(1);
});
