import { completeClipUpload } from "@/lib/server/dal/clip-uploads";
import { apiRoute, idParams } from "@/lib/server/http/route";

// POST /api/clips/{id}/complete — the file is uploaded: check it and queue processing (once).
export const POST = apiRoute({ params: idParams }, async ({ actor, params }) => {
  const { clip, queued } = await completeClipUpload(actor, params.id);
  return { id: clip.id, state: clip.state, queued };
});
