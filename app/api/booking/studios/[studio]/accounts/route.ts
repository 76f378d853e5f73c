import { NextResponse } from "next/server";
import { golferAccountSchema, slugParams } from "@/lib/booking/schemas";
import { createGolferAccount } from "@/lib/server/dal/booking-accounts";
import { jsonBody, publicRoute } from "../../../_lib/public-route";

// POST /api/booking/studios/{slug}/accounts — public: create a golfer account at this studio (then sign in).
export const POST = publicRoute({ params: slugParams }, async ({ params, request }) =>
  NextResponse.json(await createGolferAccount(params.studio, golferAccountSchema.parse(await jsonBody(request))), { status: 201 }),
);
