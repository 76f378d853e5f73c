import { z } from "zod";
import { createMark, listMarks } from "@/lib/server/dal/marks";
import { apiRoute, created, idParams } from "@/lib/server/http/route";

// GET /api/clips/{id}/marks — every mark on the clip, in drawing order.
export const GET = apiRoute({ params: idParams }, ({ actor, params }) => listMarks(actor, params.id));

// POST /api/clips/{id}/marks — draw a mark; answers with it and the recomputed measurements.
export const POST = apiRoute({ params: idParams, body: z.unknown() }, async ({ actor, params, body }) =>
  created(await createMark(actor, params.id, body)),
);
