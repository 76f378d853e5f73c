// The access matrix runner: each area of the API lists its routes with the status every
// role must get on its own golfer's data, another golfer's of the same studio, and another
// studio's. Area files live in tests/integration/access/.
import { beforeAll, describe, expect, it } from "vitest";
import { call, signIn, type Auth } from "./http";
import { makeWorld, PASSWORD, type World } from "./world";

export type Who = "admin" | "fitter" | "coach" | "golfer" | "anon";
export type Target = "own" | "sibling" | "other";
export type Expect = Record<Who, number>;

export type MatrixCase<W extends World = World> = {
  route: string;
  request: (w: W, t: Target) => { method: string; path: string; body?: unknown } | Promise<{ method: string; path: string; body?: unknown }>;
  /** `any` for routes with no golfer data in them (the call is made once). */
  expect: Partial<Record<Target, Expect>> & { any?: Expect };
};

export const golferOf = (w: World, t: Target) => (t === "own" ? w.own : t === "sibling" ? w.sibling : w.other);
export const all = (status: number, anon = 401): Expect => ({ admin: status, fitter: status, coach: status, golfer: status, anon });

/** Reading golfer data: studio staff; the coach only what was shared; the golfer only its own. */
export const readGolfer = {
  own: { admin: 200, fitter: 200, coach: 200, golfer: 200, anon: 401 },
  sibling: { admin: 200, fitter: 200, coach: 404, golfer: 404, anon: 401 },
  other: all(404),
};
/** Changing golfer data: studio staff only; those who may read get 403, the rest 404. */
export const writeGolfer = (ok: number) => ({
  own: { admin: ok, fitter: ok, coach: 403, golfer: 403, anon: 401 },
  sibling: { admin: ok, fitter: ok, coach: 404, golfer: 404, anon: 401 },
  other: all(404),
});

export function runMatrix<W extends World>(area: string, cases: MatrixCase<W>[], extend: (w: World) => Promise<W> = async (w) => w as W) {
  let world: W;
  const auth: Record<Who, Auth> = { admin: null, fitter: null, coach: null, golfer: null, anon: null };

  beforeAll(async () => {
    world = await extend(await makeWorld());
    const emails: Record<Exclude<Who, "anon">, string> = { admin: world.admin.email, fitter: world.fitter.email, coach: world.coach.email, golfer: world.own.account.email };
    for (const [who, email] of Object.entries(emails) as [Exclude<Who, "anon">, string][]) {
      const { cookie } = await signIn(email, PASSWORD);
      expect(cookie, `${who} signs in`).toBeTruthy();
      auth[who] = { cookie: cookie! };
    }
  });

  describe(`access matrix: ${area}`, () => {
    for (const c of cases) {
      const targets: Target[] = c.expect.any ? ["own"] : (Object.keys(c.expect) as Target[]);
      for (const target of targets) {
        const expected = c.expect.any ?? c.expect[target]!;
        it(`${c.route} on ${c.expect.any ? "studio" : target} data`, async () => {
          const got: Partial<Record<Who, number>> = {};
          for (const who of Object.keys(expected) as Who[]) {
            const { method, path, body } = await c.request(world, target);
            got[who] = (await call(auth[who], method, path, body)).status;
          }
          expect(got).toEqual(expected);
        });
      }
    }
  });
}
