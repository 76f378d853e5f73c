import { NextResponse } from "next/server";
import { z } from "zod";
import { frameLink, LINK_SECONDS } from "@/lib/server/dal/clip-media";
import { apiRoute } from "@/lib/server/http/route";

const params = z.object({ id: z.string().uuid(), n: z.coerce.number().int().min(0).max(19_999) });

// GET /api/clips/{id}/frames/{n} — redirect to a short-lived link to frame n's JPEG (0-based).
export const GET = apiRoute({ params }, async ({ actor, params }) => {
  const url = await frameLink(actor, params.id, params.n);
  return NextResponse.redirect(url, { status: 302, headers: { "cache-control": `private, max-age=${LINK_SECONDS - 60}` } });
});
