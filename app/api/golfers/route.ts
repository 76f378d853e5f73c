import { createGolfer, listGolfers } from "@/lib/server/dal/golfers";
import { apiRoute, created } from "@/lib/server/http/route";
import { golferCreateSchema, golferListQuery } from "@/lib/schemas/golfer";

// GET /api/golfers?q=&sort=name|updated|lastFitting&dir=asc|desc&limit=&offset= — the golfers the actor may see, one page.
export const GET = apiRoute({ query: golferListQuery }, ({ actor, query }) => listGolfers(actor, query));

// POST /api/golfers — add a golfer to the actor's studio.
export const POST = apiRoute({ body: golferCreateSchema }, async ({ actor, body }) => created(await createGolfer(actor, body)));
