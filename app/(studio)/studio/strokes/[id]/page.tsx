import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { StrokeViewer } from "@/components/strokes/stroke-viewer";
import { ApiError } from "@/lib/server/http/errors";
import { getStroke } from "@/lib/server/dal/strokes";
import { requirePageActor } from "@/lib/server/page-actor";

export const metadata: Metadata = { title: "Stroke" };

export default async function StrokePage({ params }: { params: Promise<{ id: string }> }) {
  const actor = await requirePageActor();
  const stroke = await getStroke(actor, (await params).id).catch((err: unknown) => {
    if (err instanceof ApiError && (err.code === "not_found" || err.code === "forbidden")) notFound();
    throw err;
  });
  return (
    <div className="flex flex-col gap-4">
      <p className="text-label text-slate-600"><Link href={`/studio/fittings/${stroke.fittingId}`}>Fitting</Link> / {stroke.buildLabel}</p>
      <h1 className="text-title">Stroke {stroke.position}: every view at the same moment</h1>
      <StrokeViewer clips={stroke.clips} />
    </div>
  );
}
