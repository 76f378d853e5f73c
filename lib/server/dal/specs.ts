import "server-only";
import { and, desc, eq, isNull } from "drizzle-orm";
import type { z } from "zod";
import { db, schema } from "@/db";
import { freezeSpec, type SpecData } from "@/lib/compare/spec-data";
import { specLines } from "@/lib/compare/spec-lines";
import type { specIssueSchema } from "@/lib/schemas/fitting";
import { assertGolfer, type SignedInActor } from "../access";
import { ApiError, notFound } from "../http/errors";
import { sendMail } from "../mail";
import { specPdf } from "../pdf/spec-pdf";
import { feeCreditNote } from "./booking-payments";
import { getComparison } from "./comparison";
import { fittingForWrite } from "./fittings";
import { getGolfer } from "./golfers";

const { specs, golfers, studios } = schema;

/** A golfer's specs, the current one first (older ones are kept as history). */
export async function listSpecsOfGolfer(actor: SignedInActor, golferId: string) {
  await getGolfer(actor, golferId);
  const rows = await db.select().from(specs).where(eq(specs.golferId, golferId)).orderBy(desc(specs.issuedAt));
  return rows.map((r) => ({ ...r, data: r.data as SpecData }));
}

export async function getSpec(actor: SignedInActor, id: string) {
  const [row] = await db.select().from(specs).where(eq(specs.id, id));
  if (!row) throw notFound("No such spec");
  await assertGolfer(actor, "golfer.read", { studioId: row.studioId, golferId: row.golferId }, "No such spec");
  return { ...row, data: row.data as SpecData };
}

/**
 * Issues a build as the golfer's spec: a frozen copy, never edited afterwards. The golfer's current
 * spec is marked superseded in the same transaction (history kept). Then e-mailed with the PDF.
 */
export async function issueSpec(actor: SignedInActor, fittingId: string, input: z.infer<typeof specIssueSchema>) {
  const fitting = await fittingForWrite(actor, fittingId);
  const { comparison, fitting: full } = await getComparison(actor, fittingId);
  const build = full.builds.find((b) => b.id === input.buildId);
  if (!build) throw new ApiError("unprocessable", "That build is not part of this fitting");
  const [[golfer], [studio]] = await Promise.all([
    db.select().from(golfers).where(eq(golfers.id, fitting.golferId)),
    db.select({ name: studios.name }).from(studios).where(eq(studios.id, fitting.studioId)),
  ]);
  const issuedAt = new Date();
  // A paid fitting fee credited toward the order is printed on the spec for the build shop.
  const credit = await feeCreditNote(actor, fittingId);
  const data = freezeSpec({
    studioName: studio!.name,
    golfer: { name: golfer!.name, handedness: golfer!.handedness },
    fitting: { id: fitting.id, scheduledAt: fitting.scheduledAt, notes: fitting.notes },
    build,
    comparison: comparison.builds.find((b) => b.buildId === build.id) ?? null,
    notes: [input.notes, credit].filter(Boolean).join("\n"),
    buildShop: input.buildShop,
    issuedBy: actor.name,
    issuedAt,
  });
  const spec = await db.transaction(async (tx) => {
    await tx.update(specs).set({ supersededAt: issuedAt }).where(and(eq(specs.golferId, golfer!.id), isNull(specs.supersededAt)));
    // Issuing the spec completes the fitting ("spec issued" on screen).
    await tx.update(schema.fittings).set({ status: "completed", updatedAt: issuedAt }).where(eq(schema.fittings.id, fitting.id));
    const [row] = await tx
      .insert(specs)
      .values({ studioId: fitting.studioId, golferId: golfer!.id, fittingId, buildId: build.id, issuedBy: actor.userId, issuedAt, data })
      .returning();
    return { ...row!, data };
  });
  const email = input.sendEmail ? await mailSpec(spec.data, golfer!.email) : { sent: false, to: null, error: null };
  return { spec, email };
}

/** E-mails an issued spec again (for example after the golfer's address was corrected). */
export async function emailSpec(actor: SignedInActor, id: string) {
  const spec = await getSpec(actor, id);
  await assertGolfer(actor, "golfer.write", { studioId: spec.studioId, golferId: spec.golferId });
  const [golfer] = await db.select({ email: golfers.email }).from(golfers).where(eq(golfers.id, spec.golferId));
  return mailSpec(spec.data, golfer?.email ?? null);
}

async function mailSpec(data: SpecData, to: string | null) {
  if (!to) return { sent: false, to: null, error: "The golfer has no e-mail address on record" };
  const lines = specLines(data);
  const text = [
    `Hello ${data.golfer.name},`, "", `Here is the putter spec from your fitting at ${data.studioName}. The PDF is attached.`, "",
    ...lines.sections.flatMap((s) => [s.title, ...s.rows.map(([k, v]) => `  ${k}: ${v}`), ""]),
    lines.footer,
  ].join("\n");
  try {
    await sendMail({
      to,
      subject: `Your putter spec from ${data.studioName}`,
      text,
      attachments: [{ filename: `putter-spec-${slug(data.golfer.name)}.pdf`, content: await specPdf(data), contentType: "application/pdf" }],
    });
    return { sent: true, to, error: null };
  } catch (err) {
    console.error("spec e-mail failed", err);
    return { sent: false, to, error: "The e-mail could not be sent; the spec is issued — try sending it again" };
  }
}

export const slug = (s: string) => s.toLowerCase().replace(/[^a-z0-9]+/g, "-").replace(/^-|-$/g, "") || "golfer";
