import { unreadSummary } from "@/lib/server/dal/comment-unread";
import { apiRoute } from "@/lib/server/http/route";

// GET /api/comments/unread — unread comment counts per clip for the signed-in person.
export const GET = apiRoute({}, ({ actor }) => unreadSummary(actor));
