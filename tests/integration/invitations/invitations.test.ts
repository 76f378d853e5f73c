// Invitations by e-mail: the link's token (random, hashed, single use, 7 days), accepting it
// creates and links the account, coach access golfer by golfer and its withdrawal.
import { createHash, randomBytes } from "node:crypto";
import { eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { db, schema } from "@/db";
import { BASE, call, signIn, type Auth } from "../../support/http";
import { makeWorld, PASSWORD, type World } from "../../support/world";
import { inviteTokenIn, waitForMail } from "./mail";

let w: World;
let admin: Auth;
let fitter: Auth;
const NEW_PASSWORD = "a long new password 1";

async function newGolfer(name: string) {
  const email = `${name.toLowerCase().replace(/\W+/g, ".")}.${randomBytes(3).toString("hex")}@test.fitframe`;
  const res = await call(admin, "POST", "/api/golfers", { name, email });
  expect(res.status).toBe(201);
  return { id: (res.body.golfer?.id ?? res.body.id) as string, email };
}

async function invite(auth: Auth, body: Record<string, unknown>) {
  const res = await call(auth, "POST", "/api/invitations", body);
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  const [mail] = (await waitForMail(body.email as string)).slice(-1);
  return { id: res.body.invitation.id as string, token: inviteTokenIn(mail!), mail: mail! };
}

const accept = (token: string, password = NEW_PASSWORD) => call(null, "POST", "/api/invitations/accept", { token, password });

beforeAll(async () => {
  w = await makeWorld();
  admin = { cookie: (await signIn(w.admin.email, PASSWORD)).cookie! };
  fitter = { cookie: (await signIn(w.fitter.email, PASSWORD)).cookie! };
});

describe("golfer invitation", () => {
  it("sends a link with 256 random bits; only its SHA-256 is stored", async () => {
    const g = await newGolfer("Ines Quarry");
    const { id, token, mail } = await invite(admin, { role: "golfer", golferId: g.id, email: g.email });
    expect(mail.subject).toContain(w.studioA.name);
    expect(Buffer.from(token, "base64url").length).toBe(32);
    const [row] = await db.select().from(schema.invitations).where(eq(schema.invitations.id, id));
    expect(row!.tokenHash).toBe(createHash("sha256").update(token).digest("hex"));
    expect(row!.tokenHash).not.toContain(token);
    const days = (row!.expiresAt.getTime() - row!.createdAt.getTime()) / 86_400_000;
    expect(days).toBeCloseTo(7, 2);
  });

  it("sets the password once, links the account to the golfer, then refuses the same link", async () => {
    const g = await newGolfer("Tomas Ledger");
    const { token } = await invite(fitter, { role: "golfer", golferId: g.id, email: g.email });
    const page = await fetch(`${BASE}/invite/${token}`);
    expect(await page.text()).toContain("Choose a password");
    const first = await accept(token);
    expect(first.status, JSON.stringify(first.body)).toBe(201);
    expect(first.body).toMatchObject({ role: "golfer", home: "/me" });
    const session = await signIn(g.email, NEW_PASSWORD);
    expect(session.cookie).toBeTruthy();
    const me = await call({ cookie: session.cookie! }, "GET", "/api/me");
    expect(me.body.golferId ?? me.body.golfer?.id).toBe(g.id);
    expect((await call({ cookie: session.cookie! }, "GET", `/api/golfers/${w.own.golfer.id}`)).status).toBe(404);
    const again = await accept(token, "another password 22");
    expect(again.status).toBe(409);
    expect(await (await fetch(`${BASE}/invite/${token}`)).text()).toContain("already been used");
  });

  it("refuses a wrong token, an expired one and a withdrawn one", async () => {
    expect((await accept(randomBytes(32).toString("base64url"))).status).toBe(404);
    expect(await (await fetch(`${BASE}/invite/not-a-real-token-at-all-000000`)).text()).toContain("not valid");
    const g = await newGolfer("Ada Expiry");
    const expired = await invite(admin, { role: "golfer", golferId: g.id, email: g.email });
    await db.update(schema.invitations).set({ expiresAt: new Date(Date.now() - 1000) }).where(eq(schema.invitations.id, expired.id));
    expect((await accept(expired.token)).status).toBe(422);
    const g2 = await newGolfer("Wim Drawn");
    const withdrawn = await invite(admin, { role: "golfer", golferId: g2.id, email: g2.email });
    expect((await call(admin, "DELETE", `/api/invitations/${withdrawn.id}`)).status).toBe(200);
    expect((await accept(withdrawn.token)).status).toBe(404);
  });

  it("refuses a short password, a golfer that already has an account and a taken e-mail", async () => {
    const g = await newGolfer("Pia Short");
    const { token } = await invite(admin, { role: "golfer", golferId: g.id, email: g.email });
    expect((await accept(token, "short")).status).toBe(400);
    expect((await call(admin, "POST", "/api/invitations", { role: "golfer", golferId: w.own.golfer.id, email: "x@test.fitframe" })).status).toBe(409);
    expect((await call(admin, "POST", "/api/invitations", { role: "coach", name: "Dup", email: w.coach.email })).status).toBe(409);
  });

  it("refuses a cross-site accept (no Origin of ours)", async () => {
    const res = await fetch(`${BASE}/api/invitations/accept`, { method: "POST", headers: { "content-type": "application/json", origin: "http://evil.example" }, body: JSON.stringify({ token: "x".repeat(43), password: NEW_PASSWORD }) });
    expect(res.status).toBe(403);
  });
});

describe("coach invitation and access golfer by golfer", () => {
  it("a coach invited for a golfer sees that golfer only; withdrawal takes effect on the next request", async () => {
    const email = `coach.${randomBytes(3).toString("hex")}@test.fitframe`;
    const { token } = await invite(admin, { role: "coach", name: "Rosa Putt", email, golferId: w.sibling.golfer.id });
    expect((await accept(token)).body).toMatchObject({ role: "coach", home: "/studio" });
    const coach = { cookie: (await signIn(email, NEW_PASSWORD)).cookie! };
    const [user] = await db.select().from(schema.users).where(eq(schema.users.email, email));
    expect(user!.studioId).toBe(w.studioA.id);
    expect((await call(coach, "GET", `/api/golfers/${w.sibling.golfer.id}`)).status).toBe(200);
    expect((await call(coach, "GET", `/api/golfers/${w.own.golfer.id}`)).status).toBe(404);

    const list = await call(fitter, "GET", `/api/golfers/${w.sibling.golfer.id}/coaches`);
    expect(list.body.coaches.map((c: { userId: string }) => c.userId)).toContain(user!.id);
    expect(list.body.available.map((c: { userId: string }) => c.userId)).toContain(w.coach.id);

    expect((await call(fitter, "DELETE", `/api/golfers/${w.sibling.golfer.id}/coaches/${user!.id}`)).status).toBe(200);
    expect((await call(coach, "GET", `/api/golfers/${w.sibling.golfer.id}`)).status).toBe(404);
    expect((await call(fitter, "DELETE", `/api/golfers/${w.sibling.golfer.id}/coaches/${user!.id}`)).status).toBe(404);

    expect((await call(fitter, "POST", `/api/golfers/${w.sibling.golfer.id}/coaches`, { coachUserId: user!.id })).status).toBe(200);
    expect((await call(coach, "GET", `/api/golfers/${w.sibling.golfer.id}`)).status).toBe(200);
  });

  it("only a coach of the same studio can be given a golfer", async () => {
    expect((await call(admin, "POST", `/api/golfers/${w.own.golfer.id}/coaches`, { coachUserId: w.fitter.id })).status).toBe(404);
    expect((await call(admin, "POST", `/api/golfers/${w.own.golfer.id}/coaches`, { coachUserId: w.otherAdmin.id })).status).toBe(404);
  });
});
