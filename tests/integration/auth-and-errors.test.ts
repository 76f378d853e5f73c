// Sign-in, sessions and bad input: the right status, a clear error, nothing written or leaked.
import { count, eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { db, schema } from "@/db";
import { BASE, call, signIn } from "../support/http";
import { makeWorld, PASSWORD, type World } from "../support/world";

let w: World;
beforeAll(async () => {
  w = await makeWorld();
});

const golferCount = async () => (await db.select({ n: count() }).from(schema.golfers).where(eq(schema.golfers.studioId, w.studioA.id)))[0]!.n;

describe("sign-in", () => {
  it("accepts the right password and carries the role", async () => {
    const { cookie } = await signIn(w.fitter.email, PASSWORD);
    const me = await call({ cookie: cookie! }, "GET", "/api/me");
    expect(me.body).toMatchObject({ role: "fitter", email: w.fitter.email, via: "session" });
  });

  it("refuses a wrong password and an unknown user alike, and logs the failure", async () => {
    const wrong = await signIn(w.coach.email, "not the password");
    const unknown = await signIn(`nobody.${w.tag}@test.fitframe`, PASSWORD);
    expect(wrong).toMatchObject({ cookie: null, error: "CredentialsSignin" });
    expect(unknown).toMatchObject({ cookie: null, error: "CredentialsSignin" });
    const logged = await db.select().from(schema.signInFailures).where(eq(schema.signInFailures.email, w.coach.email));
    expect(logged.length).toBe(1);
  });

  it("refuses a disabled user with its own message", async () => {
    await db.update(schema.users).set({ disabled: true }).where(eq(schema.users.id, w.fitter2.id));
    expect(await signIn(w.fitter2.email, PASSWORD)).toMatchObject({ cookie: null, error: "AccountDisabled" });
  });

  it("answers 429 after 10 failures for one account from one address", async () => {
    const email = w.sibling.account.email;
    for (let i = 0; i < 10; i++) expect((await signIn(email, `wrong-${i}`)).error).toBe("CredentialsSignin");
    const limited = await signIn(email, PASSWORD);
    expect(limited.status).toBe(429);
    expect(limited.cookie).toBeNull();
  });
});

describe("sessions", () => {
  it("ends a session at once when the admin disables the account", async () => {
    const { cookie } = await signIn(w.coach.email, PASSWORD);
    expect((await call({ cookie: cookie! }, "GET", "/api/me")).status).toBe(200);
    const admin = await signIn(w.admin.email, PASSWORD);
    expect((await call({ cookie: admin.cookie! }, "PATCH", `/api/users/${w.coach.id}`, { disabled: true })).status).toBe(200);
    expect((await call({ cookie: cookie! }, "GET", "/api/me")).status).toBe(401);
    await db.update(schema.users).set({ disabled: false }).where(eq(schema.users.id, w.coach.id));
  });

  it("ends a session at once on a role change", async () => {
    const { cookie } = await signIn(w.own.account.email, PASSWORD);
    const admin = await signIn(w.admin.email, PASSWORD);
    await call({ cookie: admin.cookie! }, "PATCH", `/api/users/${w.own.account.id}`, { role: "golfer" });
    expect((await call({ cookie: cookie! }, "GET", "/api/me")).status).toBe(401);
  });

  it("refuses a forged or expired session cookie", async () => {
    const forged = await call({ cookie: "next-auth.session-token=eyJhbGciOiJkaXIiLCJlbmMiOiJBMjU2R0NNIn0.forged.forged.forged.forged" }, "GET", "/api/me");
    expect(forged.status).toBe(401);
    expect(forged.body.error.code).toBe("unauthorized");
  });

  it("redirects a signed-out visitor from a studio page to sign-in", async () => {
    const res = await fetch(`${BASE}/studio`, { redirect: "manual" });
    expect(res.status).toBe(307);
    expect(res.headers.get("location")).toContain("/sign-in");
  });
});

describe("bad input", () => {
  let cookie: string;
  beforeAll(async () => {
    cookie = (await signIn(w.fitter.email, PASSWORD)).cookie!;
  });

  it("malformed JSON: 400 invalid_json, nothing written", async () => {
    const before = await golferCount();
    const res = await call({ cookie }, "POST", "/api/golfers", "{name: oops");
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe("invalid_json");
    expect(await golferCount()).toBe(before);
  });

  it("missing fields: 400 with the field named, nothing written", async () => {
    const before = await golferCount();
    const res = await call({ cookie }, "POST", "/api/golfers", { handedness: "right" });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe("validation_failed");
    expect(res.body.error.issues[0].path).toBe("name");
    expect(await golferCount()).toBe(before);
  });

  it("a malformed id: 400, not a stack trace", async () => {
    const res = await call({ cookie }, "GET", "/api/golfers/not-a-uuid");
    expect(res.status).toBe(400);
    expect(JSON.stringify(res.body)).not.toMatch(/at .*\.(js|ts):\d+/);
  });

  it("another studio's ids: 404 and nothing written", async () => {
    const res = await call({ cookie }, "POST", `/api/fittings/${w.other.fitting.id}/builds`, { label: "Sneaky" });
    expect(res.status).toBe(404);
    const builds = await db.select().from(schema.builds).where(eq(schema.builds.fittingId, w.other.fitting.id));
    expect(builds.map((b) => b.label)).toEqual(["Baseline"]);
  });

  it("a golfer asking for another golfer's record gets 404, with no detail", async () => {
    const own = (await signIn(w.own.account.email, PASSWORD)).cookie!;
    const res = await call({ cookie: own }, "GET", `/api/golfers/${w.sibling.golfer.id}`);
    expect(res.status).toBe(404);
    expect(JSON.stringify(res.body)).not.toContain(w.sibling.golfer.name);
  });

  it("a cross-site write with a session cookie is refused (Origin check)", async () => {
    const res = await call({ cookie }, "POST", "/api/golfers", { name: "From elsewhere" }, { origin: "http://evil.example" });
    expect(res.status).toBe(403);
  });

  it("a build off the 0.25 in length step is refused with the rule in words", async () => {
    const res = await call({ cookie }, "POST", `/api/fittings/${w.own.fitting.id}/builds`, { label: "Odd", lengthIn: 34.1 });
    expect(res.status).toBe(400);
    expect(res.body.error.message).toContain("0.25 in");
  });
});
