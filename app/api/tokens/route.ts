import { z } from "zod";
import { createToken, listTokens } from "@/lib/server/dal/tokens";
import { apiRoute, created } from "@/lib/server/http/route";

// GET /api/tokens — the actor's personal API tokens (never their values).
export const GET = apiRoute({}, async ({ actor }) => ({ tokens: await listTokens(actor) }));

// POST /api/tokens — a new token; its value is in this answer only.
export const POST = apiRoute({ body: z.object({ name: z.string().trim().min(1).max(100) }) }, async ({ actor, body }) =>
  created(await createToken(actor, body.name)),
);
