import { slugParams } from "@/lib/booking/schemas";
import { publicStudio } from "@/lib/server/dal/booking-setup";
import { publicRoute } from "../../_lib/public-route";

// GET /api/booking/studios/{slug} — public: the studio, its fitting types (fee, length) and fitters.
export const GET = publicRoute({ params: slugParams }, ({ params }) => publicStudio(params.studio));
