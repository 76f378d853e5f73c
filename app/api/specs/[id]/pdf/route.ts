import { getSpec, slug } from "@/lib/server/dal/specs";
import { apiRoute, idParams } from "@/lib/server/http/route";
import { specPdf } from "@/lib/server/pdf/spec-pdf";

// GET /api/specs/{id}/pdf — the spec as a PDF (?compress=0 leaves the text streams readable).
export const GET = apiRoute({ params: idParams }, async ({ actor, params, request }) => {
  const spec = await getSpec(actor, params.id);
  const pdf = await specPdf(spec.data, { compress: request.nextUrl.searchParams.get("compress") !== "0" });
  return new Response(new Uint8Array(pdf), {
    headers: {
      "content-type": "application/pdf",
      "content-disposition": `inline; filename="putter-spec-${slug(spec.data.golfer.name)}.pdf"`,
      "cache-control": "private, no-store",
    },
  });
});
