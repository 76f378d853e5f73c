// Access matrix for the foundation routes: me, golfers, fittings, builds, tokens, users.
import { expect, it } from "vitest";
import { all, golferOf, readGolfer, runMatrix, writeGolfer, type MatrixCase } from "../../support/matrix";
import { call } from "../../support/http";
import { makeWorld, tokenFor, type World } from "../../support/world";

type W = World & { foreignTokenId: string };

const cases: MatrixCase<W>[] = [
  { route: "GET /api/me", request: () => ({ method: "GET", path: "/api/me" }), expect: { any: all(200) } },
  { route: "GET /api/golfers", request: () => ({ method: "GET", path: "/api/golfers" }), expect: { any: { admin: 200, fitter: 200, coach: 200, golfer: 403, anon: 401 } } },
  { route: "POST /api/golfers", request: () => ({ method: "POST", path: "/api/golfers", body: { name: "New Golfer" } }), expect: { any: { admin: 201, fitter: 201, coach: 403, golfer: 403, anon: 401 } } },
  { route: "GET /api/golfers/{id}", request: (w, t) => ({ method: "GET", path: `/api/golfers/${golferOf(w, t).golfer.id}` }), expect: readGolfer },
  { route: "PATCH /api/golfers/{id}", request: (w, t) => ({ method: "PATCH", path: `/api/golfers/${golferOf(w, t).golfer.id}`, body: { intake: { usualMiss: "short" } } }), expect: writeGolfer(200) },
  { route: "GET /api/golfers/{id}/fittings", request: (w, t) => ({ method: "GET", path: `/api/golfers/${golferOf(w, t).golfer.id}/fittings` }), expect: readGolfer },
  { route: "POST /api/fittings", request: (w, t) => ({ method: "POST", path: "/api/fittings", body: { golferId: golferOf(w, t).golfer.id, scheduledAt: "2026-12-02T10:00:00Z" } }), expect: writeGolfer(201) },
  { route: "GET /api/fittings/{id}", request: (w, t) => ({ method: "GET", path: `/api/fittings/${golferOf(w, t).fitting.id}` }), expect: readGolfer },
  { route: "PATCH /api/fittings/{id}", request: (w, t) => ({ method: "PATCH", path: `/api/fittings/${golferOf(w, t).fitting.id}`, body: { notes: "checked" } }), expect: writeGolfer(200) },
  { route: "POST /api/fittings/{id}/builds", request: (w, t) => ({ method: "POST", path: `/api/fittings/${golferOf(w, t).fitting.id}/builds`, body: { label: "Mallet", lengthIn: 34.25 } }), expect: writeGolfer(201) },
  { route: "PATCH /api/builds/{id}", request: (w, t) => ({ method: "PATCH", path: `/api/builds/${golferOf(w, t).build.id}`, body: { loftDeg: 3.5 } }), expect: writeGolfer(200) },
  { route: "GET /api/tokens", request: () => ({ method: "GET", path: "/api/tokens" }), expect: { any: { admin: 200, fitter: 200, coach: 403, golfer: 403, anon: 401 } } },
  { route: "POST /api/tokens", request: () => ({ method: "POST", path: "/api/tokens", body: { name: "capture PC" } }), expect: { any: { admin: 201, fitter: 201, coach: 403, golfer: 403, anon: 401 } } },
  { route: "DELETE /api/tokens/{id} (someone else's)", request: (w) => ({ method: "DELETE", path: `/api/tokens/${w.foreignTokenId}` }), expect: { any: { admin: 404, fitter: 404, coach: 403, golfer: 403, anon: 401 } } },
  { route: "GET /api/users", request: () => ({ method: "GET", path: "/api/users" }), expect: { any: { admin: 200, fitter: 403, coach: 403, golfer: 403, anon: 401 } } },
  {
    route: "PATCH /api/users/{id}",
    request: (w, t) => ({ method: "PATCH", path: `/api/users/${t === "other" ? w.otherAdmin.id : w.sibling.account.id}`, body: { disabled: false } }),
    expect: { sibling: { admin: 200, fitter: 403, coach: 403, golfer: 403, anon: 401 }, other: { admin: 404, fitter: 403, coach: 403, golfer: 403, anon: 401 } },
  },
];

runMatrix("foundation", cases, async (w) => ({ ...w, foreignTokenId: (await tokenFor(w.fitter2.id)).id }));

it("a Bearer token acts as its owner, within its studio", async () => {
  const w = await makeWorld();
  const token = await tokenFor(w.fitter.id);
  const me = await call({ token: token.value }, "GET", "/api/me");
  expect(me.status).toBe(200);
  expect(me.body.role).toBe("fitter");
  expect((await call({ token: token.value }, "GET", `/api/golfers/${w.other.golfer.id}`)).status).toBe(404);
});
