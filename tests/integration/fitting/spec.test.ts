// Issuing a spec: a frozen copy, a PDF (pdfkit), an e-mail with the PDF attached (read back from
// the mail catcher), the golfer reads it; a second spec supersedes the first, which stays unchanged.
import { beforeAll, describe, expect, it } from "vitest";
import { call, signIn } from "../../support/http";
import { makeWorld, PASSWORD, type World } from "../../support/world";
import { addMeasuredClips, mailTo } from "./helpers";

import { pdftotext } from "../../support/pdf";

let w: World;
let fitter: { cookie: string };
let golfer: { cookie: string };
let first: { id: string; data: Record<string, unknown> };

beforeAll(async () => {
  w = await makeWorld();
  fitter = { cookie: (await signIn(w.fitter.email, PASSWORD)).cookie! };
  golfer = { cookie: (await signIn(w.own.account.email, PASSWORD)).cookie! };
  await call(fitter, "PATCH", `/api/builds/${w.own.build.id}`, { headModel: "Mallet M2", neckStyle: "plumber", lengthIn: 34, lieDeg: 70, loftDeg: 3, headMassG: 355, gripName: "Pistol 60", gripMassG: 60, shaftMassG: 110, designShaftLeanDeg: 2, gripMaxWidthIn: 1.76 });
  // Start directions −0.3, −0.8, −0.5, −0.8: mean −2.4 / 4 = −0.6°.
  const starts = [-0.3, -0.8, -0.5, -0.8];
  await addMeasuredClips(w, w.own.build, [0.3, -0.2, 0.1, 0].map((v, i) => ({ face_angle_impact: v, start_direction: starts[i]! })));
  const issued = await call(fitter, "POST", `/api/fittings/${w.own.fitting.id}/specs`, { buildId: w.own.build.id, notes: "Keep the flat side up", buildShop: { gripOrientation: "flat side up", finishNotes: "black" } });
  expect(issued.status).toBe(201);
  first = issued.body.spec;
  expect(issued.body.email).toEqual({ sent: true, to: w.own.account.email, error: null });
});

describe("issuing a spec", () => {
  it("freezes the build-shop fields, key measurements and notes", () => {
    expect(first.data).toMatchObject({
      golfer: { name: w.own.golfer.name },
      buildShop: { head: "Mallet M2", neck: "plumber", lengthIn: 34, lieDeg: 70, loftDeg: 3, grip: "Pistol 60", gripOrientation: "flat side up", headMassG: 355, finishNotes: "black" },
      notes: "Keep the flat side up",
    });
    const face = (first.data.keyMeasurements as { key: string; n: number; mean: number }[]).find((m) => m.key === "face_angle_impact")!;
    expect(face.n).toBe(4);
    expect(face.mean).toBeCloseTo(0.05, 12); // (0.3 − 0.2 + 0.1 + 0) / 4
    // Equipment Rules 2019, Part 2, 3b(iii): a grip 1.76 in across is over the 1.75 in limit.
    expect((first.data.warnings as { field: string }[]).map((x) => x.field)).toEqual(["gripMaxWidthIn"]);
  });

  it("the PDF as Debian's pdftotext reads it: the golfer, the build shop, a true \u2212 (−0.6°), the studio, no stray quote marks", async () => {
    const res = await fetch(`${process.env.TEST_BASE_URL}/api/specs/${first.id}/pdf?compress=0`, { headers: { cookie: fitter.cookie } });
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toBe("application/pdf");
    const bytes = Buffer.from(await res.arrayBuffer());
    expect(bytes.subarray(0, 5).toString("latin1")).toBe("%PDF-");
    const text = await pdftotext(bytes);
    expect(text).toContain("mean \u22120.6°");
    expect(text).toContain(w.studioA.name);
    expect(text).not.toMatch(/["\u201c\u201d]/);
    // Label and value on one line, in two columns.
    expect(text).toMatch(/Head {2,}Mallet M2/);
    expect(text).toContain(w.own.golfer.name);
    expect(text).toContain("Mallet M2");
    expect(text).toContain("flat side up");
    expect(text).toContain("Designed shaft lean");
    expect(text).toContain("2° forward");
    expect(text).toContain("Equipment Rules, Part 2, 3b(iii)");
  });

  it("the e-mail reaches the golfer with the PDF attached", async () => {
    const mails = await mailTo(w.own.account.email);
    expect(mails).toHaveLength(1);
    expect(mails[0]!.subject).toContain("putter spec");
    expect(mails[0]!.text).toContain("Mallet M2");
    const pdf = mails[0]!.attachments.find((a) => a.contentType === "application/pdf")!;
    expect(pdf.filename).toMatch(/\.pdf$/);
    expect(Buffer.from(pdf.contentBase64, "base64").subarray(0, 5).toString("latin1")).toBe("%PDF-");
  });

  it("the golfer reads its spec; another golfer cannot", async () => {
    const mine = await call(golfer, "GET", `/api/golfers/${w.own.golfer.id}/specs`);
    expect(mine.status).toBe(200);
    expect(mine.body.specs[0].id).toBe(first.id);
    expect((await call(golfer, "GET", `/api/specs/${first.id}`)).status).toBe(200);
    const page = await fetch(`${process.env.TEST_BASE_URL}/me/specs/${first.id}`, { headers: { cookie: golfer.cookie } });
    expect(await page.text()).toContain("Mallet M2");
    const sibling = { cookie: (await signIn(w.sibling.account.email, PASSWORD)).cookie! };
    expect((await call(sibling, "GET", `/api/specs/${first.id}`)).status).toBe(404);
  });

  it("is never changed: a later build change and a second spec leave the first as issued; the second supersedes it", async () => {
    await call(fitter, "PATCH", `/api/builds/${w.own.build.id}`, { lengthIn: 35 });
    const second = await call(fitter, "POST", `/api/fittings/${w.own.fitting.id}/specs`, { buildId: w.own.build.id, sendEmail: false });
    expect(second.status).toBe(201);
    expect(second.body.spec.data.buildShop.lengthIn).toBe(35);
    const old = await call(fitter, "GET", `/api/specs/${first.id}`);
    expect(old.body.data).toEqual(first.data);
    expect(old.body.supersededAt).not.toBeNull();
    const list = await call(fitter, "GET", `/api/golfers/${w.own.golfer.id}/specs`);
    expect(list.body.specs.map((s: { id: string; supersededAt: string | null }) => [s.id, s.supersededAt === null])).toEqual([[second.body.spec.id, true], [first.id, false]]);
  });

  it("refuses a build of another fitting", async () => {
    const res = await call(fitter, "POST", `/api/fittings/${w.own.fitting.id}/specs`, { buildId: w.sibling.build.id });
    expect(res.status).toBe(422);
  });
});
