import { NextResponse } from "next/server";
import { revokeToken } from "@/lib/server/dal/tokens";
import { apiRoute, idParams } from "@/lib/server/http/route";

// DELETE /api/tokens/{id} — revoke one of the actor's tokens.
export const DELETE = apiRoute({ params: idParams }, async ({ actor, params }) => {
  await revokeToken(actor, params.id);
  return new NextResponse(null, { status: 204 });
});
