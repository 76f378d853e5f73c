import { withdrawInvitation } from "@/lib/server/dal/invitations";
import { apiRoute, idParams } from "@/lib/server/http/route";

// DELETE /api/invitations/{id} — withdraw an unused invitation; its link stops working at once.
export const DELETE = apiRoute({ params: idParams }, ({ actor, params }) => withdrawInvitation(actor, params.id));
