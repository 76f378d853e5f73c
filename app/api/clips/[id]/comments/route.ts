import { commentCreateSchema } from "@/lib/schemas/comments";
import { createComment, listComments } from "@/lib/server/dal/comments";
import { apiRoute, created, idParams } from "@/lib/server/http/route";

// GET /api/clips/{id}/comments — the clip's comment threads in frame order, each with its replies.
export const GET = apiRoute({ params: idParams }, ({ actor, params }) => listComments(actor, params.id));

// POST /api/clips/{id}/comments — a comment at a frame, or a reply (parentId); plain text, 1–4000 characters.
export const POST = apiRoute({ params: idParams, body: commentCreateSchema }, async ({ actor, params, body }) => created(await createComment(actor, params.id, body)));
