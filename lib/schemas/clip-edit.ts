import { z } from "zod";

/** A putt set aside from the statistics, with the fitter's reason; null puts it back. */
export const mishitSchema = z.object({ reason: z.string().trim().min(1, "say why the putt is set aside").max(200) }).strict().nullable();

/**
 * PATCH /api/clips/{id}: the clip's settings (capture fps, mirroring, slow motion, tracking) and the
 * session's corrections — `buildId` moves the putt to another build of the fitting, `mishit` sets it
 * aside or back. Any subset; an empty body changes nothing.
 */
export const clipPatchSchema = z
  .object({
    captureFps: z.number().positive().max(100_000, "captureFps must be at most 100000 frames per second"),
    mirrored: z.boolean(),
    slowMotionFactor: z.number().positive().max(1000),
    // Off: the tracker's proposals are left out of the measurements and not made again.
    trackingEnabled: z.boolean(),
    buildId: z.string().uuid("must be an id (uuid)"),
    mishit: mishitSchema,
  })
  .partial()
  .strict();

export type ClipPatch = z.infer<typeof clipPatchSchema>;
