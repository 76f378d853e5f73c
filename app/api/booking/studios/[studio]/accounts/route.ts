import { NextResponse } from "next/server";
import { golferAccountSchema, slugParams } from "@/lib/booking/schemas";
import { clientIp } from "@/lib/server/auth/sign-in-limit";
import { createGolferAccount } from "@/lib/server/dal/booking-accounts";
import { jsonBody, publicRoute } from "../../../_lib/public-route";

// POST /api/booking/studios/{slug}/accounts — public: create a golfer account at this studio (then sign in);
// at most 10 new accounts per client IP an hour (429 after).
export const POST = publicRoute({ params: slugParams }, async ({ params, request }) => {
  const input = golferAccountSchema.parse(await jsonBody(request));
  return NextResponse.json(await createGolferAccount(params.studio, input, clientIp(request.headers)), { status: 201 });
});
