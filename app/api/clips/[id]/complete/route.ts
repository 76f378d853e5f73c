import { completeClipUpload } from "@/lib/server/dal/clip-uploads";
import { apiRoute, idParams } from "@/lib/server/http/route";
import { clipCompleteSchema } from "@/lib/schemas/clip-upload";

// POST /api/clips/{id}/complete — the file is uploaded: check it and queue processing (once).
// A file sent in parts names its `uploadId` and `parts` ({ partNumber, etag }).
export const POST = apiRoute({ params: idParams, body: clipCompleteSchema }, async ({ actor, params, body }) => {
  const { clip, queued } = await completeClipUpload(actor, params.id, body);
  return { id: clip.id, state: clip.state, queued };
});
