import { createStudioScreenLink, revokeStudioScreenLinks } from "@/lib/server/dal/studio-screen";
import { apiRoute, created, idParams } from "@/lib/server/http/route";

// POST /api/fittings/{id}/studio-screen — a new read-only studio-screen link for this fitting (older ones stop working).
export const POST = apiRoute({ params: idParams }, async ({ actor, params }) => created(await createStudioScreenLink(actor, params.id)));

// DELETE /api/fittings/{id}/studio-screen — every studio-screen link of this fitting stops working.
export const DELETE = apiRoute({ params: idParams }, ({ actor, params }) => revokeStudioScreenLinks(actor, params.id));
