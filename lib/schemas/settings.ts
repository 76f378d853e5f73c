// Studio settings: shared by the settings form and the API.
import { z } from "zod";

const fps = z.number({ error: "Enter frames per second" }).int("Whole frames per second").min(24, "At least 24 fps").max(10000, "At most 10000 fps");

export const windowSchema = z
  .object({ min: z.number({ error: "Enter a number" }), max: z.number({ error: "Enter a number" }) })
  .refine((w) => w.min <= w.max, { message: "The low end must not be above the high end", path: ["max"] });

export const studioSettingsSchema = z.object({
  units: z.enum(["ft", "m"]),
  speedUnit: z.enum(["m/s", "ft/s", "mph"]).optional(),
  frictionMu: z.number({ error: "Enter μ as a number" }).gt(0, "μ must be above 0").max(1, "μ is at most 1"),
  windows: z.record(z.string().regex(/^[a-z_]+$/, "A measurement key"), windowSchema),
  cameraFps: z.object({ overhead: fps, "face-on": fps, "down-the-line": fps }),
});

export type StudioSettingsInput = z.infer<typeof studioSettingsSchema>;
