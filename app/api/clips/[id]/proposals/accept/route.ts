import { acceptProposals, acceptProposalsSchema } from "@/lib/server/dal/clips";
import { apiRoute, idParams } from "@/lib/server/http/route";

// POST /api/clips/{id}/proposals/accept — the tracker's address and impact become the moments; proposals marked accepted.
export const POST = apiRoute({ params: idParams, body: acceptProposalsSchema }, ({ actor, params, body }) => acceptProposals(actor, params.id, body));
