// Shared by the API (validation at the edge) and the forms (same messages).
import { z } from "zod";

const optionalNumber = (min: number, max: number) => z.number().min(min).max(max).optional();

export const intakeSchema = z.object({
  puttingStyle: z.string().trim().max(200).optional(),
  usualMiss: z.string().trim().max(200).optional(),
  ball: z.string().trim().max(200).optional(),
  currentPutter: z
    .object({
      headStyle: z.string().trim().max(200).optional(),
      lengthIn: optionalNumber(18, 60),
      lieDeg: optionalNumber(55, 80),
      loftDeg: optionalNumber(-5, 10),
      grip: z.string().trim().max(200).optional(),
    })
    .optional(),
  greenSpeedFt: optionalNumber(4, 16),
  heightCm: optionalNumber(90, 230),
  notes: z.string().max(4000).optional(),
});

export const golferCreateSchema = z.object({
  name: z.string().trim().min(1, "Enter the golfer's name").max(200),
  email: z.string().trim().toLowerCase().email("Enter a valid e-mail address").optional(),
  handedness: z.enum(["right", "left"]).default("right"),
  isMinor: z.boolean().default(false),
  intake: intakeSchema.default({}),
});

export const golferUpdateSchema = z.object({
  name: golferCreateSchema.shape.name.optional(),
  email: golferCreateSchema.shape.email,
  handedness: z.enum(["right", "left"]).optional(),
  isMinor: z.boolean().optional(),
  intake: intakeSchema.optional(),
});

export const golferListQuery = z.object({
  q: z.string().trim().max(100).optional(),
  limit: z.coerce.number().int().min(1).max(100).default(25),
  offset: z.coerce.number().int().min(0).default(0),
});
