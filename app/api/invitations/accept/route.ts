import { NextResponse, type NextRequest } from "next/server";
import { env } from "@/lib/config/env";
import { invitationAcceptSchema } from "@/lib/schemas/invitations";
import { acceptInvitation } from "@/lib/server/dal/invitations";
import { ApiError, errorResponse } from "@/lib/server/http/errors";

// POST /api/invitations/accept — public: set a password with an invitation's token; creates the account once.
export async function POST(request: NextRequest) {
  try {
    // A browser form: it must come from our own site.
    if (request.headers.get("origin") !== new URL(env().NEXTAUTH_URL).origin) {
      throw new ApiError("forbidden", "Cross-site request refused: the Origin header must be this site");
    }
    const text = await request.text();
    if (text.length > 16 * 1024) throw new ApiError("payload_too_large", "The request body is too large");
    let json: unknown;
    try {
      json = text.trim() ? JSON.parse(text) : {};
    } catch {
      throw new ApiError("invalid_json", "The request body is not valid JSON");
    }
    return NextResponse.json(await acceptInvitation(invitationAcceptSchema.parse(json)), { status: 201 });
  } catch (err) {
    return errorResponse(err);
  }
}
