import { createInvitation, listInvitations } from "@/lib/server/dal/invitations";
import { apiRoute, created } from "@/lib/server/http/route";
import { invitationCreateSchema } from "@/lib/schemas/invitations";

// GET /api/invitations — the studio's invitations, newest first (staff).
export const GET = apiRoute({}, ({ actor }) => listInvitations(actor));

// POST /api/invitations — invite a golfer or a coach by e-mail (staff); sends the single-use link.
export const POST = apiRoute({ body: invitationCreateSchema }, async ({ actor, body }) => created(await createInvitation(actor, body)));
