import { issueSpec } from "@/lib/server/dal/specs";
import { apiRoute, created, idParams } from "@/lib/server/http/route";
import { specIssueSchema } from "@/lib/schemas/fitting";

// POST /api/fittings/{id}/specs — issue a build as the golfer's spec (supersedes the current one) and e-mail it.
export const POST = apiRoute({ params: idParams, body: specIssueSchema }, async ({ actor, params, body }) =>
  created(await issueSpec(actor, params.id, body)),
);
