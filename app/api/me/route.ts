import { apiRoute } from "@/lib/server/http/route";

// GET /api/me — who the request is signed in as.
export const GET = apiRoute({}, async ({ actor }) => ({
  id: actor.userId,
  name: actor.name,
  email: actor.email,
  role: actor.role,
  studioId: actor.studioId,
  golferId: actor.golferId,
  via: actor.via,
}));
