import type { Metadata } from "next";
import Link from "next/link";
import { SpecSheet } from "@/components/specs/spec-sheet";
import { requirePageActor } from "@/lib/server/page-actor";
import { getSpec } from "@/lib/server/dal/specs";

export const metadata: Metadata = { title: "My putter spec" };

export default async function GolferSpecPage({ params }: { params: Promise<{ id: string }> }) {
  const actor = await requirePageActor();
  const spec = await getSpec(actor, (await params).id);
  return (
    <main className="mx-auto flex max-w-3xl flex-col gap-4 p-4">
      <Link href="/me" className="min-h-touch text-slate-600 print:hidden">← Back</Link>
      <SpecSheet spec={spec.data} id={spec.id} supersededAt={spec.supersededAt} />
    </main>
  );
}
