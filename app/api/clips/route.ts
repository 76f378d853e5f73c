import { createClipUpload, listClipsOfFitting } from "@/lib/server/dal/clip-uploads";
import { apiRoute, created } from "@/lib/server/http/route";
import { clipCreateSchema, clipListQuery } from "@/lib/schemas/clip-upload";

// GET /api/clips?fittingId= — a fitting's clips with state and progress (polled by the upload panel).
export const GET = apiRoute({ query: clipListQuery }, async ({ actor, query }) => ({
  clips: await listClipsOfFitting(actor, query.fittingId),
}));

// POST /api/clips — register a clip and get a presigned PUT URL for its file.
export const POST = apiRoute({ body: clipCreateSchema }, async ({ actor, body }) => created(await createClipUpload(actor, body)));
