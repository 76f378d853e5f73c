// Access matrix for the clip pipeline's routes: registering uploads, completing them, the
// live list, the frame and media links, and the session's corrections (move, mishit, delete).
import { db, schema } from "@/db";
import { all, golferOf, readGolfer, runMatrix, writeGolfer, type MatrixCase, type Target } from "../../support/matrix";
import type { World } from "../../support/world";
import { insertClip } from "../../support/clip-rows";

type Clip = Awaited<ReturnType<typeof insertClip>>;
type W = World & { clips: Record<Target, Clip>; strokes: Record<Target, string> };

const SENT_SHA256 = "5e".repeat(32);
const clipPath = (w: W, t: Target) => `/api/clips/${w.clips[t].id}`;
const redirectTo = (okStatus: number) => ({
  own: { admin: okStatus, fitter: okStatus, coach: okStatus, golfer: okStatus, anon: 401 },
  sibling: { admin: okStatus, fitter: okStatus, coach: 404, golfer: 404, anon: 401 },
  other: all(404),
});

const cases: MatrixCase<W>[] = [
  {
    route: "POST /api/clips",
    request: (w, t) => ({
      method: "POST", path: "/api/clips",
      body: { fittingId: golferOf(w, t).fitting.id, buildId: golferOf(w, t).build.id, view: "overhead", fileName: "p.mp4", contentType: "video/mp4", sizeBytes: 100, consentConfirmed: true },
    }),
    expect: writeGolfer(201),
  },
  // A file the fitting already has (same SHA-256): the existing clip, 200, to those who may write.
  {
    route: "POST /api/clips (a file already sent)",
    request: (w, t) => ({
      method: "POST", path: "/api/clips",
      body: { fittingId: golferOf(w, t).fitting.id, buildId: golferOf(w, t).build.id, view: "overhead", fileName: "again.mp4", contentType: "video/mp4", sizeBytes: 1_000_000, contentSha256: SENT_SHA256 },
    }),
    expect: writeGolfer(200),
  },
  { route: "GET /api/clips?fittingId=", request: (w, t) => ({ method: "GET", path: `/api/clips?fittingId=${golferOf(w, t).fitting.id}` }), expect: readGolfer },
  // The clip is already processed, so an allowed completion queues nothing and answers 200.
  { route: "POST /api/clips/{id}/complete", request: (w, t) => ({ method: "POST", path: `${clipPath(w, t)}/complete` }), expect: writeGolfer(200) },
  // The clip's file has arrived, so an allowed request for part URLs is refused with 409.
  { route: "POST /api/clips/{id}/parts", request: (w, t) => ({ method: "POST", path: `${clipPath(w, t)}/parts`, body: { partNumbers: [1, 2] } }), expect: writeGolfer(409) },
  { route: "GET /api/clips/{id}/frames/{n}", request: (w, t) => ({ method: "GET", path: `${clipPath(w, t)}/frames/3` }), expect: redirectTo(302) },
  { route: "GET /api/clips/{id}/media/poster", request: (w, t) => ({ method: "GET", path: `${clipPath(w, t)}/media/poster` }), expect: redirectTo(302) },
  { route: "GET /api/clips/{id}/media/proxy", request: (w, t) => ({ method: "GET", path: `${clipPath(w, t)}/media/proxy` }), expect: redirectTo(302) },
  { route: "PATCH /api/clips/{id} (mishit)", request: (w, t) => ({ method: "PATCH", path: clipPath(w, t), body: { mishit: { reason: "off the toe" } } }), expect: writeGolfer(200) },
  // Its own build again: allowed callers change nothing and get 200.
  { route: "PATCH /api/clips/{id} (buildId)", request: (w, t) => ({ method: "PATCH", path: clipPath(w, t), body: { buildId: golferOf(w, t).build.id } }), expect: writeGolfer(200) },
  // A fresh clip for every caller: an allowed delete removes it.
  { route: "DELETE /api/clips/{id}", request: async (w, t) => ({ method: "DELETE", path: `/api/clips/${(await insertClip(golferOf(w, t))).id}` }), expect: writeGolfer(200) },
  { route: "GET /api/builds/{id}/strokes", request: (w, t) => ({ method: "GET", path: `/api/builds/${golferOf(w, t).build.id}/strokes` }), expect: readGolfer },
  { route: "POST /api/builds/{id}/strokes", request: (w, t) => ({ method: "POST", path: `/api/builds/${golferOf(w, t).build.id}/strokes` }), expect: writeGolfer(201) },
  { route: "GET /api/strokes/{id}", request: (w, t) => ({ method: "GET", path: `/api/strokes/${w.strokes[t]}` }), expect: readGolfer },
];

runMatrix("clip pipeline", cases, async (w) => {
  const clips = {} as Record<Target, Clip>;
  const strokes = {} as Record<Target, string>;
  for (const t of ["own", "sibling", "other"] as Target[]) {
    const owner = golferOf(w, t);
    clips[t] = await insertClip(owner, { contentSha256: SENT_SHA256 });
    const [stroke] = await db.insert(schema.strokes).values({ studioId: owner.fitting.studioId, buildId: owner.build.id, position: 1 }).returning();
    strokes[t] = stroke!.id;
  }
  return { ...w, clips, strokes };
});
