// Access matrix for the fitting workflow's routes: golfers list, golfer data, builds, comparison,
// CSV, specs, PDF, e-mail, export, delete and studio settings.
import { db, schema } from "@/db";
import { freezeSpec } from "@/lib/compare/spec-data";
import { all, golferOf, readGolfer, runMatrix, writeGolfer, type MatrixCase, type Target } from "../../support/matrix";
import type { World } from "../../support/world";

type W = World & { specs: Record<Target, string> };

const settings = { units: "ft", frictionMu: 0.2, windows: {}, cameraFps: { overhead: 240, "face-on": 240, "down-the-line": 240 } };
const spec = (w: W, t: Target) => w.specs[t];
/** Export: staff and the golfer itself; a coach is refused what it may read. */
const exportGolfer = { own: { admin: 200, fitter: 200, coach: 403, golfer: 200, anon: 401 }, sibling: readGolfer.sibling, other: all(404) };
/** Erase: the studio's admin and the golfer itself (sibling/other: asked of data one may not see, or refused). */
const eraseGolfer = { own: { admin: 400, fitter: 403, coach: 403, golfer: 400, anon: 401 }, sibling: { admin: 400, fitter: 403, coach: 404, golfer: 404, anon: 401 }, other: all(404) };

const cases: MatrixCase<W>[] = [
  { route: "GET /api/golfers?sort=lastFitting", request: () => ({ method: "GET", path: "/api/golfers?sort=lastFitting&dir=desc&q=g" }), expect: { any: { admin: 200, fitter: 200, coach: 200, golfer: 403, anon: 401 } } },
  { route: "GET /api/golfers/{id}/specs", request: (w, t) => ({ method: "GET", path: `/api/golfers/${golferOf(w, t).golfer.id}/specs` }), expect: readGolfer },
  { route: "GET /api/golfers/{id}/export", request: (w, t) => ({ method: "GET", path: `/api/golfers/${golferOf(w, t).golfer.id}/export` }), expect: exportGolfer },
  // without the confirmation word: the access decision shows (400 = allowed but not confirmed) and nothing is deleted
  { route: "DELETE /api/golfers/{id}", request: (w, t) => ({ method: "DELETE", path: `/api/golfers/${golferOf(w, t).golfer.id}`, body: {} }), expect: eraseGolfer },
  { route: "POST /api/builds/{id}/duplicate", request: (w, t) => ({ method: "POST", path: `/api/builds/${golferOf(w, t).build.id}/duplicate`, body: { change: { loftDeg: 4 } } }), expect: writeGolfer(201) },
  { route: "GET /api/fittings/{id}/comparison", request: (w, t) => ({ method: "GET", path: `/api/fittings/${golferOf(w, t).fitting.id}/comparison` }), expect: readGolfer },
  { route: "PUT /api/fittings/{id}/recording", request: (w, t) => ({ method: "PUT", path: `/api/fittings/${golferOf(w, t).fitting.id}/recording`, body: { buildId: golferOf(w, t).build.id } }), expect: writeGolfer(200) },
  { route: "GET /api/fittings/{id}/session", request: (w, t) => ({ method: "GET", path: `/api/fittings/${golferOf(w, t).fitting.id}/session` }), expect: readGolfer },
  { route: "POST /api/fittings/{id}/studio-screen", request: (w, t) => ({ method: "POST", path: `/api/fittings/${golferOf(w, t).fitting.id}/studio-screen` }), expect: writeGolfer(201) },
  { route: "DELETE /api/fittings/{id}/studio-screen", request: (w, t) => ({ method: "DELETE", path: `/api/fittings/${golferOf(w, t).fitting.id}/studio-screen` }), expect: writeGolfer(200) },
  { route: "GET /api/fittings/{id}/csv", request: (w, t) => ({ method: "GET", path: `/api/fittings/${golferOf(w, t).fitting.id}/csv` }), expect: readGolfer },
  { route: "POST /api/fittings/{id}/specs", request: (w, t) => ({ method: "POST", path: `/api/fittings/${golferOf(w, t).fitting.id}/specs`, body: { buildId: golferOf(w, t).build.id, sendEmail: false } }), expect: writeGolfer(201) },
  { route: "GET /api/specs/{id}", request: (w, t) => ({ method: "GET", path: `/api/specs/${spec(w, t)}` }), expect: readGolfer },
  { route: "GET /api/specs/{id}/pdf", request: (w, t) => ({ method: "GET", path: `/api/specs/${spec(w, t)}/pdf` }), expect: readGolfer },
  { route: "POST /api/specs/{id}/email", request: (w, t) => ({ method: "POST", path: `/api/specs/${spec(w, t)}/email` }), expect: writeGolfer(200) },
  { route: "GET /api/studio/settings", request: () => ({ method: "GET", path: "/api/studio/settings" }), expect: { any: { admin: 200, fitter: 403, coach: 403, golfer: 403, anon: 401 } } },
  { route: "PUT /api/studio/settings", request: () => ({ method: "PUT", path: "/api/studio/settings", body: settings }), expect: { any: { admin: 200, fitter: 403, coach: 403, golfer: 403, anon: 401 } } },
];

runMatrix("fitting", cases, async (w) => {
  const specs = {} as Record<Target, string>;
  for (const t of ["own", "sibling", "other"] as const) {
    const g = golferOf(w, t);
    const [row] = await db
      .insert(schema.specs)
      .values({ studioId: g.golfer.studioId, golferId: g.golfer.id, fittingId: g.fitting.id, buildId: g.build.id, data: freezeSpec({
        studioName: "Studio", golfer: { name: g.golfer.name, handedness: "right" }, fitting: { id: g.fitting.id, scheduledAt: g.fitting.scheduledAt, notes: "" },
        build: g.build, comparison: null, notes: "", buildShop: {}, issuedBy: "Fitter", issuedAt: new Date(),
      }) })
      .returning();
    specs[t] = row!.id;
  }
  return { ...w, specs };
});
