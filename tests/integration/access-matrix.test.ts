// The access matrix: every API route, called as each role (and signed out), on the actor's
// own golfer, on another golfer of the same studio and on another studio's golfer.
// Later routes add their rows to `cases` below.
import { beforeAll, describe, expect, it } from "vitest";
import { call, signIn, type Auth } from "../support/http";
import { makeWorld, PASSWORD, tokenFor, type World } from "../support/world";

type Who = "admin" | "fitter" | "coach" | "golfer" | "anon";
type Target = "own" | "sibling" | "other";
type Expect = Record<Who, number>;

type Case = {
  route: string;
  request: (w: World, t: Target) => { method: string; path: string; body?: unknown };
  expect: Partial<Record<Target, Expect>> & { any?: Expect };
};

const golferOf = (w: World, t: Target) => (t === "own" ? w.own : t === "sibling" ? w.sibling : w.other);
const all = (status: number, anon = 401): Expect => ({ admin: status, fitter: status, coach: status, golfer: status, anon });
// Reading golfer data: staff of the studio; the coach only what was shared; the golfer only its own.
const readGolfer = { own: { admin: 200, fitter: 200, coach: 200, golfer: 200, anon: 401 }, sibling: { admin: 200, fitter: 200, coach: 404, golfer: 404, anon: 401 }, other: all(404) };
const writeGolfer = (ok: number) => ({
  own: { admin: ok, fitter: ok, coach: 403, golfer: 403, anon: 401 },
  sibling: { admin: ok, fitter: ok, coach: 404, golfer: 404, anon: 401 },
  other: all(404),
});

const cases: Case[] = [
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
  { route: "DELETE /api/tokens/{id} (someone else's)", request: (w) => ({ method: "DELETE", path: `/api/tokens/${(w as World & { foreignTokenId: string }).foreignTokenId}` }), expect: { any: { admin: 404, fitter: 404, coach: 403, golfer: 403, anon: 401 } } },
  { route: "GET /api/users", request: () => ({ method: "GET", path: "/api/users" }), expect: { any: { admin: 200, fitter: 403, coach: 403, golfer: 403, anon: 401 } } },
  {
    route: "PATCH /api/users/{id}",
    request: (w, t) => ({ method: "PATCH", path: `/api/users/${t === "other" ? w.otherAdmin.id : w.sibling.account.id}`, body: { disabled: false } }),
    expect: { sibling: { admin: 200, fitter: 403, coach: 403, golfer: 403, anon: 401 }, other: { admin: 404, fitter: 403, coach: 403, golfer: 403, anon: 401 } },
  },
];

let world: World & { foreignTokenId: string };
const auth: Record<Who, Auth> = { admin: null, fitter: null, coach: null, golfer: null, anon: null };

beforeAll(async () => {
  const w = await makeWorld();
  world = { ...w, foreignTokenId: (await tokenFor(w.fitter2.id)).id };
  const emails: Record<Exclude<Who, "anon">, string> = { admin: w.admin.email, fitter: w.fitter.email, coach: w.coach.email, golfer: w.own.account.email };
  for (const [who, email] of Object.entries(emails) as [Exclude<Who, "anon">, string][]) {
    const { cookie } = await signIn(email, PASSWORD);
    expect(cookie, `${who} signs in`).toBeTruthy();
    auth[who] = { cookie: cookie! };
  }
});

describe("access matrix", () => {
  for (const c of cases) {
    const targets = (Object.keys(c.expect) as (Target | "any")[]).map((t) => (t === "any" ? "own" : t));
    for (const target of targets) {
      const expected = c.expect[target] ?? c.expect.any!;
      it(`${c.route} on ${c.expect.any ? "studio" : target} data`, async () => {
        const got: Partial<Record<Who, number>> = {};
        for (const who of Object.keys(expected) as Who[]) {
          const { method, path, body } = c.request(world, target);
          got[who] = (await call(auth[who], method, path, body)).status;
        }
        expect(got).toEqual(expected);
      });
    }
  }

  it("a Bearer token acts as its owner", async () => {
    const token = await tokenFor(world.fitter.id);
    const me = await call({ token: token.value }, "GET", "/api/me");
    expect(me.status).toBe(200);
    expect(me.body.role).toBe("fitter");
    expect((await call({ token: token.value }, "GET", `/api/golfers/${world.other.golfer.id}`)).status).toBe(404);
  });
});
