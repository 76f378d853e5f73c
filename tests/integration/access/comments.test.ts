// Access matrix for comments, invitations and coach access (role × route × own/sibling/other).
import { randomBytes } from "node:crypto";
import { db, schema } from "@/db";
import { all, golferOf, readGolfer, runMatrix, writeGolfer, type MatrixCase, type Target } from "../../support/matrix";
import type { World } from "../../support/world";
import { insertClip } from "../comments/clip-row";

type W = World & { clip: Record<Target, string>; comment: Record<Target, string>; coach2: string; foreignInvitation: string };

const staffOnly = { admin: 200, fitter: 200, coach: 403, golfer: 403, anon: 401 };
const email = () => `invitee.${randomBytes(4).toString("hex")}@test.fitframe`;

const cases: MatrixCase<W>[] = [
  { route: "GET /api/clips/{id}/comments", request: (w, t) => ({ method: "GET", path: `/api/clips/${w.clip[t]}/comments` }), expect: readGolfer },
  {
    route: "POST /api/clips/{id}/comments",
    request: (w, t) => ({ method: "POST", path: `/api/clips/${w.clip[t]}/comments`, body: { frame: 3, body: "matrix" } }),
    expect: { own: { admin: 201, fitter: 201, coach: 201, golfer: 201, anon: 401 }, sibling: { admin: 201, fitter: 201, coach: 404, golfer: 404, anon: 401 }, other: all(404) },
  },
  { route: "POST /api/clips/{id}/comments/read", request: (w, t) => ({ method: "POST", path: `/api/clips/${w.clip[t]}/comments/read` }), expect: readGolfer },
  {
    route: "PATCH /api/comments/{id} (a fitter's thread)",
    request: (w, t) => ({ method: "PATCH", path: `/api/comments/${w.comment[t]}`, body: { resolved: true } }),
    expect: { own: { admin: 200, fitter: 200, coach: 403, golfer: 403, anon: 401 }, sibling: { admin: 200, fitter: 200, coach: 404, golfer: 404, anon: 401 }, other: all(404) },
  },
  { route: "GET /api/comments/unread", request: () => ({ method: "GET", path: "/api/comments/unread" }), expect: { any: all(200) } },
  { route: "GET /api/invitations", request: () => ({ method: "GET", path: "/api/invitations" }), expect: { any: staffOnly } },
  {
    route: "POST /api/invitations (a coach for a golfer)",
    request: (w, t) => ({ method: "POST", path: "/api/invitations", body: { role: "coach", name: "Matrix Coach", email: email(), golferId: golferOf(w, t).golfer.id } }),
    expect: { own: { ...staffOnly, admin: 201, fitter: 201 }, sibling: { ...staffOnly, admin: 201, fitter: 201 }, other: { admin: 404, fitter: 404, coach: 403, golfer: 403, anon: 401 } },
  },
  {
    route: "DELETE /api/invitations/{id} (another studio's)",
    request: (w) => ({ method: "DELETE", path: `/api/invitations/${w.foreignInvitation}` }),
    expect: { any: { admin: 404, fitter: 404, coach: 403, golfer: 403, anon: 401 } },
  },
  {
    route: "POST /api/invitations/accept (public; a wrong token)",
    request: () => ({ method: "POST", path: "/api/invitations/accept", body: { token: randomBytes(32).toString("base64url"), password: "long enough password" } }),
    expect: { any: all(404, 404) },
  },
  { route: "GET /api/golfers/{id}/coaches", request: (w, t) => ({ method: "GET", path: `/api/golfers/${golferOf(w, t).golfer.id}/coaches` }), expect: writeGolfer(200) },
  {
    route: "POST /api/golfers/{id}/coaches",
    request: (w, t) => ({ method: "POST", path: `/api/golfers/${golferOf(w, t).golfer.id}/coaches`, body: { coachUserId: w.coach2 } }),
    expect: writeGolfer(200),
  },
  {
    route: "DELETE /api/golfers/{id}/coaches/{userId}",
    request: async (w, t) => {
      // Re-share before every call so each role meets a share to withdraw.
      if (t !== "other") await db.insert(schema.coachGolfers).values({ coachUserId: w.coach2, golferId: golferOf(w, t).golfer.id }).onConflictDoNothing();
      return { method: "DELETE", path: `/api/golfers/${golferOf(w, t).golfer.id}/coaches/${w.coach2}` };
    },
    expect: writeGolfer(200),
  },
];

runMatrix("comments, invitations, coach access", cases, async (w) => {
  const clip = {} as Record<Target, string>;
  const comment = {} as Record<Target, string>;
  for (const t of ["own", "sibling", "other"] as const) {
    const c = await insertClip(w, golferOf(w, t));
    clip[t] = c.id;
    const [row] = await db.insert(schema.comments).values({ studioId: c.studioId, clipId: c.id, authorUserId: w.fitter.id, frame: 10, body: "fitter's note" }).returning();
    comment[t] = row!.id;
  }
  const [coach2] = await db.insert(schema.users).values({ studioId: w.studioA.id, role: "coach", email: `coach2.${w.tag}@test.fitframe`, name: `coach2 ${w.tag}` }).returning();
  const [inv] = await db.insert(schema.invitations).values({
    studioId: w.studioB.id, tokenHash: randomBytes(32).toString("hex"), email: email(), name: "Foreign", role: "coach", expiresAt: new Date(Date.now() + 86_400_000),
  }).returning();
  return { ...w, clip, comment, coach2: coach2!.id, foreignInvitation: inv!.id };
});
