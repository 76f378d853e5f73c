import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { SpecSheet } from "@/components/specs/spec-sheet";
import { requirePageActor } from "@/lib/server/page-actor";
import { getSpec } from "@/lib/server/dal/specs";

export const metadata: Metadata = { title: "Spec" };

export default async function StudioSpecPage({ params }: { params: Promise<{ id: string; specId: string }> }) {
  const actor = await requirePageActor();
  const { id, specId } = await params;
  const spec = await getSpec(actor, specId);
  if (spec.fittingId !== id) notFound();
  return <SpecSheet spec={spec.data} id={spec.id} supersededAt={spec.supersededAt} />;
}
