// CSV of a fitting's measurements; a golfer's full data export (JSON + short-lived clip links)
// and its irreversible delete, clips' files removed from storage.
import { beforeAll, describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import { db, schema } from "@/db";
import { listKeys, putObject } from "@/lib/server/storage";
import { call, signIn } from "../../support/http";
import { makeWorld, PASSWORD, type World } from "../../support/world";
import { addBuild, addMeasuredClips } from "./helpers";

let w: World;
let fitter: { cookie: string };
let admin: { cookie: string };
let clips: Awaited<ReturnType<typeof addMeasuredClips>>;

beforeAll(async () => {
  w = await makeWorld();
  fitter = { cookie: (await signIn(w.fitter.email, PASSWORD)).cookie! };
  admin = { cookie: (await signIn(w.admin.email, PASSWORD)).cookie! };
  const second = await addBuild(w, "Blade, heavy");
  clips = await addMeasuredClips(w, w.own.build, [{ face_angle_impact: -0.5, path: null }, { face_angle_impact: 1.25 }]);
  clips.push(...(await addMeasuredClips(w, second, [{ start_direction: 0.75 }], "overhead", Date.UTC(2026, 0, 1, 11))));
  for (const c of clips) {
    await putObject(c.objectKey, Buffer.from("video bytes"), "video/mp4");
    await putObject(c.objectKey.replace(/source$/, "frames/000001.jpg"), Buffer.from("jpg"), "image/jpeg");
  }
});

describe("GET /api/fittings/{id}/csv", () => {
  it("one row per clip per measurement, at the screen's precision (0.1°), empty where not computable", async () => {
    const res = await call(fitter, "GET", `/api/fittings/${w.own.fitting.id}/csv`);
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toBe("text/csv; charset=utf-8");
    const lines = (res.body as string).trimEnd().split("\r\n");
    expect(lines[0]).toBe("fitting_id,build_position,build_label,clip_id,view,clip_recorded_at,key,value,uncertainty,unit,method");
    const f = w.own.fitting.id;
    expect(lines.slice(1)).toEqual([
      `${f},1,Baseline,${clips[0]!.id},overhead,2026-01-01T10:00:00.000Z,face_angle_impact,-0.5,,deg,derived`,
      `${f},1,Baseline,${clips[0]!.id},overhead,2026-01-01T10:00:00.000Z,path,,,deg,derived`,
      `${f},1,Baseline,${clips[1]!.id},overhead,2026-01-01T10:01:00.000Z,face_angle_impact,1.3,,deg,derived`,
      `${f},2,"Blade, heavy",${clips[2]!.id},overhead,2026-01-01T11:00:00.000Z,start_direction,0.8,,deg,derived`,
    ]);
  });
  it("the wide layout: one row per putt", async () => {
    const res = await call(fitter, "GET", `/api/fittings/${w.own.fitting.id}/csv?layout=wide`);
    expect(res.status).toBe(200);
    const lines = (res.body as string).trimEnd().split("\r\n");
    expect(lines[0]).toBe("fitting_id,build_position,build_label,clip_id,view,clip_recorded_at,face_angle_impact_deg,face_angle_impact_deg_se,path_deg,path_deg_se,start_direction_deg,start_direction_deg_se");
    expect(lines).toHaveLength(4);
    expect(lines[1]).toContain(`${clips[0]!.id},overhead,2026-01-01T10:00:00.000Z,-0.5,,,,,`);
  });
});

describe("a golfer's data", () => {
  it("export: everything, with clip links that fetch the video and expire in 15 minutes", async () => {
    const golfer = { cookie: (await signIn(w.own.account.email, PASSWORD)).cookie! };
    const res = await call(golfer, "GET", `/api/golfers/${w.own.golfer.id}/export`);
    expect(res.status).toBe(200);
    expect(res.body.golfer.id).toBe(w.own.golfer.id);
    expect(res.body.fittings).toHaveLength(1);
    expect(res.body.builds).toHaveLength(2);
    expect(res.body.measurements).toHaveLength(4);
    expect(res.body.linksExpireInSeconds).toBe(900);
    const link = new URL(res.body.clips[0].sourceUrl);
    expect(link.searchParams.get("X-Amz-Expires")).toBe("900");
    expect(await (await fetch(link)).text()).toBe("video bytes");
  });

  it("delete: refused without the confirmation word; then rows, account and clip files are gone", async () => {
    expect((await call(admin, "DELETE", `/api/golfers/${w.own.golfer.id}`, {})).status).toBe(400);
    const prefix = `studios/${w.studioA.id}/clips/${clips[0]!.id}/`;
    expect(await listKeys(prefix)).toHaveLength(2);
    const res = await call(admin, "DELETE", `/api/golfers/${w.own.golfer.id}`, { confirm: "DELETE" });
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ deleted: true, clips: 3, files: 6 });
    for (const c of clips) expect(await listKeys(`studios/${w.studioA.id}/clips/${c.id}/`)).toEqual([]);
    expect(await db.select().from(schema.golfers).where(eq(schema.golfers.id, w.own.golfer.id))).toEqual([]);
    expect(await db.select().from(schema.clips).where(eq(schema.clips.fittingId, w.own.fitting.id))).toEqual([]);
    expect(await db.select().from(schema.users).where(eq(schema.users.id, w.own.account.id))).toEqual([]);
    expect((await signIn(w.own.account.email, PASSWORD)).cookie).toBeNull();
    // the sibling golfer of the same studio is untouched
    expect(await db.select().from(schema.golfers).where(eq(schema.golfers.id, w.sibling.golfer.id))).toHaveLength(1);
  });
});
