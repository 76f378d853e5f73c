import { presignClipParts } from "@/lib/server/dal/clip-uploads";
import { apiRoute, idParams } from "@/lib/server/http/route";
import { clipPartsSchema } from "@/lib/schemas/clip-upload";

// POST /api/clips/{id}/parts — presigned PUTs for parts of a large file (multipart upload).
export const POST = apiRoute({ params: idParams, body: clipPartsSchema }, ({ actor, params, body }) => presignClipParts(actor, params.id, body));
