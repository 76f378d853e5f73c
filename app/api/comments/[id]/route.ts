import { commentResolveSchema } from "@/lib/schemas/comments";
import { resolveComment } from "@/lib/server/dal/comments";
import { apiRoute, idParams } from "@/lib/server/http/route";

// PATCH /api/comments/{id} — resolve or reopen a thread (`{ resolved }`): staff, or the thread's author.
export const PATCH = apiRoute({ params: idParams, body: commentResolveSchema }, ({ actor, params, body }) => resolveComment(actor, params.id, body.resolved));
