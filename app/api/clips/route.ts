import { createClipUpload, listClipsOfFitting } from "@/lib/server/dal/clip-uploads";
import { apiRoute, created } from "@/lib/server/http/route";
import { clipCreateSchema, clipListQuery } from "@/lib/schemas/clip-upload";

// GET /api/clips?fittingId= — a fitting's clips with state and progress (polled by the upload panel).
export const GET = apiRoute({ query: clipListQuery }, async ({ actor, query }) => ({
  clips: await listClipsOfFitting(actor, query.fittingId),
}));

// POST /api/clips — register a clip and get a presigned PUT URL for its file. A file whose
// contentSha256 the fitting already has is answered 200 with that clip and `duplicate: true`.
export const POST = apiRoute({ body: clipCreateSchema }, async ({ actor, body }) => {
  const result = await createClipUpload(actor, body);
  return result.duplicate ? result : created(result);
});
