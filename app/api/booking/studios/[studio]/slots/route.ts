import { slotsQuerySchema, slugParams } from "@/lib/booking/schemas";
import { listPublicSlots } from "@/lib/server/dal/booking-setup";
import { publicRoute } from "../../../_lib/public-route";

// GET /api/booking/studios/{slug}/slots?fittingTypeId=&from=&days= — public: free slots (up to 8 weeks).
export const GET = publicRoute({ params: slugParams, query: slotsQuerySchema }, ({ params, query }) => listPublicSlots(params.studio, query));
