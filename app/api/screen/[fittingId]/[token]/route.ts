import { z } from "zod";
import { publicRoute } from "@/app/api/booking/_lib/public-route";
import { STUDIO_SCREEN_REFUSALS, studioScreenSession } from "@/lib/server/dal/studio-screen";
import { ApiError } from "@/lib/server/http/errors";

const params = z.object({ fittingId: z.string().uuid("must be an id (uuid)"), token: z.string().max(200) });

// GET /api/screen/{fittingId}/{token} — the studio screen's data, with its link instead of a sign-in (read only).
export const GET = publicRoute({ params }, async ({ params: p }) => {
  const result = await studioScreenSession(p.fittingId, p.token);
  if (!result.ok) throw new ApiError(result.refusal === "unknown" ? "not_found" : "forbidden", STUDIO_SCREEN_REFUSALS[result.refusal], { refusal: result.refusal });
  return { ...result.session, expiresAt: result.expiresAt };
});
