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

const quarter = (v: number) => Math.abs(v * 4 - Math.round(v * 4)) < 1e-9;
const half = (v: number) => Math.abs(v * 2 - Math.round(v * 2)) < 1e-9;

export const buildFieldsSchema = z.object({
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
  shaftMassG: z.number().min(30).max(200).nullable().optional(),
  balancePointIn: z.number().min(0).max(60).nullable().optional(),
  alignmentAid: z.string().trim().max(200).optional(),
  notes: z.string().max(4000).optional(),
});

export const buildUpdateSchema = buildFieldsSchema.partial();

/** Duplicate a build with one thing changed (or none): the copy goes at the end. */
export const buildDuplicateSchema = z.object({
  label: z.string().trim().min(1).max(100).optional(),
  change: buildUpdateSchema.omit({ label: true }).default({}),
});

/** The build-shop sheet: what the shop needs to assemble the putter. Fields left out come from the build. */
const shopText = (max: number) => z.string().trim().max(max).optional();
export const buildShopSchema = z.object({
  head: shopText(200),
  neck: shopText(100),
  lengthIn: buildFieldsSchema.shape.lengthIn,
  lieDeg: buildFieldsSchema.shape.lieDeg,
  loftDeg: buildFieldsSchema.shape.loftDeg,
  grip: shopText(200),
  gripOrientation: shopText(200),
  headMassG: buildFieldsSchema.shape.headMassG,
  swingWeight: shopText(40),
  finishNotes: shopText(2000),
});

export const specIssueSchema = z.object({
  buildId: z.string().uuid(),
  notes: z.string().max(4000).default(""),
  buildShop: buildShopSchema.default({}),
  sendEmail: z.boolean().default(true),
});

