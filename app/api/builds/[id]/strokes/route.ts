import { createStroke, listStrokesOfBuild } from "@/lib/server/dal/strokes";
import { apiRoute, created, idParams } from "@/lib/server/http/route";

// GET /api/builds/{id}/strokes — the build's strokes, in order.
export const GET = apiRoute({ params: idParams }, async ({ actor, params }) => ({ strokes: await listStrokesOfBuild(actor, params.id) }));

// POST /api/builds/{id}/strokes — a new stroke; upload up to three clips (one per view) into it.
export const POST = apiRoute({ params: idParams }, async ({ actor, params }) => created(await createStroke(actor, params.id)));
