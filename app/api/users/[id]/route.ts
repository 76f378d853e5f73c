import { z } from "zod";
import { updateStudioUser } from "@/lib/server/dal/users";
import { apiRoute, idParams } from "@/lib/server/http/route";

const body = z
  .object({ role: z.enum(["admin", "fitter", "coach", "golfer"]).optional(), disabled: z.boolean().optional() })
  .refine((b) => b.role !== undefined || b.disabled !== undefined, "Send role or disabled");

// PATCH /api/users/{id} — change a studio account's role or disable it (admin); effective at once.
export const PATCH = apiRoute({ params: idParams, body }, ({ actor, params, body }) => updateStudioUser(actor, params.id, body));
