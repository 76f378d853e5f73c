import { z } from "zod";
import { deleteMark, updateMark } from "@/lib/server/dal/marks";
import { apiRoute } from "@/lib/server/http/route";

const params = z.object({ id: z.string().uuid("must be an id (uuid)"), markId: z.string().uuid("must be an id (uuid)") });
const deleteQuery = z.object({ version: z.coerce.number().optional() });
const deleteBody = z.object({ version: z.unknown() }).partial();

// PATCH /api/clips/{id}/marks/{markId} — change a mark; the body carries the mark's current `version`.
export const PATCH = apiRoute({ params, body: z.unknown() }, ({ actor, params, body }) =>
  updateMark(actor, params.id, params.markId, body),
);

// DELETE /api/clips/{id}/marks/{markId}?version=N — remove a mark (version in the query or the body).
export const DELETE = apiRoute({ params, query: deleteQuery, body: deleteBody }, ({ actor, params, query, body }) =>
  deleteMark(actor, params.id, params.markId, query.version ?? body.version),
);
