import { z } from "zod";

export const fittingCreateSchema = z.object({
  golferId: z.string().uuid(),
  scheduledAt: z.coerce.date(),
  notes: z.string().max(4000).default(""),
});

export const fittingUpdateSchema = z.object({
  scheduledAt: z.coerce.date().optional(),
  status: z.enum(["planned", "in_progress", "completed"]).optional(),
  notes: z.string().max(4000).optional(),
});

/** Which build new putts from the watch folder go to; null stops recording. */
export const recordingSchema = z.object({
  buildId: z.string().uuid("must be a build id (uuid) or null").nullable(),
});

const quarter = (v: number) => Math.abs(v * 4 - Math.round(v * 4)) < 1e-9;
const half = (v: number) => Math.abs(v * 2 - Math.round(v * 2)) < 1e-9;
const hundredth = (v: number) => Math.abs(v * 100 - Math.round(v * 100)) < 1e-6;

// The fields of a build. Limits are input sanity bounds, wider than the Equipment Rules, so that a
// non-conforming putter can be recorded and flagged (lib/equipment/rules.ts) rather than refused.
const buildFields = z.object({
  label: z.string().trim().min(1).max(100),
  isBaseline: z.boolean().optional(),
  headModel: z.string().trim().max(200).optional(),
  neckStyle: z.string().trim().max(100).optional(),
  lengthIn: z.number().min(10).max(60).refine(quarter, "Length goes in steps of 0.25 in").nullable().optional(),
  lieDeg: z.number().min(55).max(90).refine(half, "Lie goes in steps of 0.5°").nullable().optional(),
  loftDeg: z.number().min(-5).max(15).refine(half, "Loft goes in steps of 0.5°").nullable().optional(),
  offsetIn: z.number().min(-2).max(2).nullable().optional(),
  toeHang: z.string().trim().max(100).optional(),
  headMassG: z.number().min(200).max(800).nullable().optional(),
  gripName: z.string().trim().max(200).optional(),
  gripMassG: z.number().min(10).max(500).nullable().optional(),
  gripMaxWidthIn: z.number()
    .min(0.5, "Grip width is the largest cross-section dimension: at least 0.5 in")
    .max(3, "Grip width is the largest cross-section dimension: at most 3 in")
    .refine(hundredth, "Grip width goes in steps of 0.01 in").nullable().optional(),
  gripCount: z.number().int("A putter has one grip or two").min(1, "A putter has one grip or two").max(2, "A putter has one grip or two").optional(),
  gripsCircular: z.boolean().nullable().optional(),
  gripGapIn: z.number().min(0, "The gap between two grips cannot be negative").max(20, "The gap between two grips is at most 20 in")
    .refine(hundredth, "The gap between grips goes in steps of 0.01 in").nullable().optional(),
  designShaftLeanDeg: z.number()
    .min(-30, "Designed shaft lean is at most 30° back (−30)")
    .max(30, "Designed shaft lean is at most 30° forward")
    .refine(half, "Designed shaft lean goes in steps of 0.5°").nullable().optional(),
  shaftMassG: z.number().min(30).max(200).nullable().optional(),
  balancePointIn: z.number().min(0).max(60).nullable().optional(),
  alignmentAid: z.string().trim().max(200).optional(),
  notes: z.string().max(4000).optional(),
});

/** A gap between grips only means something with two grips; `countWhenAbsent` is what a missing count means. */
const gapNeedsTwoGrips = (countWhenAbsent: number | undefined) =>
  (v: { gripCount?: number; gripGapIn?: number | null }, ctx: z.RefinementCtx) => {
    const count = v.gripCount ?? countWhenAbsent;
    if (v.gripGapIn != null && count !== undefined && count !== 2) {
      ctx.addIssue({ code: "custom", path: ["gripGapIn"], message: "A gap between grips needs two grips: set the grip count to 2" });
    }
  };

/** A new build: the grip count is 1 unless given. */
export const buildFieldsSchema = buildFields.superRefine(gapNeedsTwoGrips(1));

/** A change to a build: checked against the grip count only when the same change sets it. */
export const buildUpdateSchema = buildFields.partial().superRefine(gapNeedsTwoGrips(undefined));

/** Duplicate a build with one thing changed (or none): the copy goes at the end. */
export const buildDuplicateSchema = z.object({
  label: z.string().trim().min(1).max(100).optional(),
  change: buildFields.partial().omit({ label: true }).superRefine(gapNeedsTwoGrips(undefined)).default({}),
});

/** The build-shop sheet: what the shop needs to assemble the putter. Fields left out come from the build. */
const shopText = (max: number) => z.string().trim().max(max).optional();
export const buildShopSchema = z.object({
  head: shopText(200),
  neck: shopText(100),
  lengthIn: buildFields.shape.lengthIn,
  lieDeg: buildFields.shape.lieDeg,
  loftDeg: buildFields.shape.loftDeg,
  grip: shopText(200),
  gripOrientation: shopText(200),
  headMassG: buildFields.shape.headMassG,
  swingWeight: shopText(40),
  finishNotes: shopText(2000),
});

export const specIssueSchema = z.object({
  buildId: z.string().uuid(),
  notes: z.string().max(4000).default(""),
  buildShop: buildShopSchema.default({}),
  sendEmail: z.boolean().default(true),
});

