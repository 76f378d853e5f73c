import { NextResponse } from "next/server";
import { z } from "zod";
import { LINK_SECONDS, MEDIA_KINDS, mediaLink } from "@/lib/server/dal/clip-media";
import { apiRoute } from "@/lib/server/http/route";

const params = z.object({ id: z.string().uuid(), kind: z.enum(MEDIA_KINDS) });

// GET /api/clips/{id}/media/{poster|strip|proxy} — redirect to a short-lived link to the file.
export const GET = apiRoute({ params }, async ({ actor, params }) => {
  const url = await mediaLink(actor, params.id, params.kind);
  return NextResponse.redirect(url, { status: 302, headers: { "cache-control": `private, max-age=${LINK_SECONDS - 60}` } });
});
