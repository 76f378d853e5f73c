// Shared by the API (validation at the edge) and the forms (same messages).
import { z } from "zod";

const optionalNumber = (min: number, max: number, what: string) =>
  z.number({ error: `Enter ${what} as a number` }).min(min, `${what} is at least ${min}`).max(max, `${what} is at most ${max}`).optional();
const optionalText = (max = 200) => z.string().trim().max(max, `At most ${max} characters`).optional();

export const PUTTING_STYLES = ["conventional", "cross-handed", "claw", "arm-lock", "other"] as const;
export const USUAL_MISSES = ["left", "right", "short", "long", "varies"] as const;

export const intakeSchema = z.object({
  puttingStyle: optionalText(),
  usualMiss: optionalText(),
  ball: optionalText(),
  currentPutter: z
    .object({
      headStyle: optionalText(),
      lengthIn: optionalNumber(18, 60, "Length (in)"),
      lieDeg: optionalNumber(55, 80, "Lie (°)"),
      loftDeg: optionalNumber(-5, 10, "Loft (°)"),
      grip: optionalText(),
    })
    .optional(),
  greenSpeedFt: optionalNumber(4, 16, "Green speed (ft)"),
  heightCm: optionalNumber(90, 230, "Height (cm)"),
  notes: z.string().max(4000, "At most 4000 characters").optional(),
});

/** Consent to record video: the golfer's own, or a guardian's (named) for a minor. */
export const consentSchema = z.object({
  given: z.boolean(),
  by: z.enum(["golfer", "guardian"]).default("golfer"),
  guardianName: optionalText(),
});

const consentRules = (v: { isMinor?: boolean; consent?: z.infer<typeof consentSchema> }, ctx: z.RefinementCtx) => {
  if (!v.consent?.given) return;
  if (v.isMinor && v.consent.by !== "guardian") ctx.addIssue({ code: "custom", path: ["consent", "by"], message: "For a minor, a guardian gives the consent" });
  if (v.consent.by === "guardian" && !v.consent.guardianName) ctx.addIssue({ code: "custom", path: ["consent", "guardianName"], message: "Enter the guardian's name" });
};

const golferFields = z.object({
  name: z.string().trim().min(1, "Enter the golfer's name").max(200, "At most 200 characters"),
  email: z.string().trim().toLowerCase().email("Enter a valid e-mail address").optional(),
  handedness: z.enum(["right", "left"]).default("right"),
  isMinor: z.boolean().default(false),
  intake: intakeSchema.default({}),
  consent: consentSchema.optional(),
});

export const golferCreateSchema = golferFields.superRefine(consentRules);

export const golferUpdateSchema = z
  .object({
    name: golferFields.shape.name.optional(),
    email: golferFields.shape.email,
    handedness: z.enum(["right", "left"]).optional(),
    isMinor: z.boolean().optional(),
    intake: intakeSchema.optional(),
    consent: consentSchema.optional(),
  })
  .superRefine(consentRules);

export const GOLFER_SORTS = ["name", "updated", "lastFitting"] as const;

export const golferListQuery = z.object({
  q: z.string().trim().max(100).optional(),
  sort: z.enum(GOLFER_SORTS).default("name"),
  dir: z.enum(["asc", "desc"]).default("asc"),
  limit: z.coerce.number().int().min(1).max(100).default(25),
  offset: z.coerce.number().int().min(0).max(1_000_000).default(0),
});

export type GolferListQuery = z.input<typeof golferListQuery>;

/** Erasing a golfer's data cannot be undone: the caller confirms with the word DELETE (checked after access). */
export const golferEraseSchema = z.object({ confirm: z.string().max(20).optional() });
export const ERASE_WORD = "DELETE";
