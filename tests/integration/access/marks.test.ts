// Access matrix for the clip review routes: the clip, its marks, moments and measurements.
import { eq } from "drizzle-orm";
import { db, schema } from "@/db";
import { all, readGolfer, runMatrix, writeGolfer, type MatrixCase, type Target } from "../../support/matrix";
import type { World } from "../../support/world";
import { insertClip, insertMark } from "../../support/clip-rows";

type Clip = Awaited<ReturnType<typeof insertClip>>;
type W = World & { clips: Record<Target, Clip>; coachMarkId: string };

/** Drawing: staff of the studio; the coach on a shared golfer; the golfer reads only. */
const drawGolfer = (ok: number) => ({
  own: { admin: ok, fitter: ok, coach: ok, golfer: 403, anon: 401 },
  sibling: { admin: ok, fitter: ok, coach: 404, golfer: 404, anon: 401 },
  other: all(404),
});

const clipPath = (w: W, t: Target) => `/api/clips/${w.clips[t].id}`;
const currentVersion = async (markId: string) =>
  (await db.select({ v: schema.marks.version }).from(schema.marks).where(eq(schema.marks.id, markId)))[0]!.v;
/** A fresh mark drawn by the fitter for each call, so that every role meets the same situation. */
const fittersMark = (w: W, t: Target) => insertMark(w.clips[t], w.fitter.id);

const cases: MatrixCase<W>[] = [
  { route: "GET /api/clips/{id}", request: (w, t) => ({ method: "GET", path: clipPath(w, t) }), expect: readGolfer },
  { route: "PATCH /api/clips/{id}", request: (w, t) => ({ method: "PATCH", path: clipPath(w, t), body: { captureFps: 240 } }), expect: writeGolfer(200) },
  { route: "PUT /api/clips/{id}/moments", request: (w, t) => ({ method: "PUT", path: `${clipPath(w, t)}/moments`, body: { impact: 300 } }), expect: writeGolfer(200) },
  { route: "POST /api/clips/{id}/proposals/accept", request: (w, t) => ({ method: "POST", path: `${clipPath(w, t)}/proposals/accept`, body: {} }), expect: writeGolfer(200) },
  { route: "POST /api/clips/{id}/tracking", request: (w, t) => ({ method: "POST", path: `${clipPath(w, t)}/tracking` }), expect: writeGolfer(200) },
  { route: "GET /api/clips/{id}/measurements", request: (w, t) => ({ method: "GET", path: `${clipPath(w, t)}/measurements` }), expect: readGolfer },
  { route: "GET /api/clips/{id}/marks", request: (w, t) => ({ method: "GET", path: `${clipPath(w, t)}/marks` }), expect: readGolfer },
  {
    route: "POST /api/clips/{id}/marks",
    request: (w, t) => ({ method: "POST", path: `${clipPath(w, t)}/marks`, body: { frame: 12, kind: "point", role: "clubhead", points: [[300, 200]] } }),
    expect: drawGolfer(201),
  },
  {
    route: "PATCH /api/clips/{id}/marks/{markId} (the fitter's mark)",
    request: async (w, t) => {
      const mark = await fittersMark(w, t);
      return { method: "PATCH", path: `${clipPath(w, t)}/marks/${mark.id}`, body: { version: mark.version, points: [[110, 100]] } };
    },
    expect: writeGolfer(200),
  },
  {
    route: "DELETE /api/clips/{id}/marks/{markId} (the fitter's mark)",
    request: async (w, t) => {
      const mark = await fittersMark(w, t);
      return { method: "DELETE", path: `${clipPath(w, t)}/marks/${mark.id}?version=${mark.version}` };
    },
    expect: writeGolfer(200),
  },
  {
    route: "PATCH /api/clips/{id}/marks/{markId} (the coach's own mark)",
    request: async (w) => ({ method: "PATCH", path: `${clipPath(w, "own")}/marks/${w.coachMarkId}`, body: { version: await currentVersion(w.coachMarkId), frame: 11 } }),
    expect: { own: { admin: 200, fitter: 200, coach: 200, golfer: 403, anon: 401 } },
  },
];

runMatrix("marks", cases, async (w) => {
  // A tracker's summary, as the worker leaves it, so that its proposals can be accepted.
  const tracking = { version: 1, ballFound: true, addressFrame: 40, impactFrame: 300, impactSource: "ball" };
  const clips = { own: await insertClip(w.own, { tracking }), sibling: await insertClip(w.sibling, { tracking }), other: await insertClip(w.other, { tracking }) };
  const coachMark = await insertMark(clips.own, w.coach.id);
  return { ...w, clips, coachMarkId: coachMark.id };
});
