import { listStudioUsers } from "@/lib/server/dal/users";
import { apiRoute } from "@/lib/server/http/route";

// GET /api/users — the studio's accounts (admin).
export const GET = apiRoute({}, async ({ actor }) => ({ users: await listStudioUsers(actor) }));
