import type { Metadata } from "next";
import { StudioScreen } from "@/components/studio-screen/studio-screen";
import { STUDIO_SCREEN_REFUSALS, studioScreenSession } from "@/lib/server/dal/studio-screen";

export const metadata: Metadata = { title: "Studio screen", referrer: "no-referrer", robots: { index: false } };
export const dynamic = "force-dynamic";

// The read-only studio screen for a second monitor or TV; its link is its only key (lib/server/dal/studio-screen.ts).
export default async function StudioScreenPage({ params }: { params: Promise<{ fittingId: string; token: string }> }) {
  const { fittingId, token } = await params;
  const uuid = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i.test(fittingId);
  const result = uuid ? await studioScreenSession(fittingId, token) : ({ ok: false, refusal: "unknown" } as const);
  if (!result.ok) {
    return (
      <main className="flex min-h-screen items-center justify-center bg-ink p-10 text-chalk">
        <div className="max-w-3xl" role="alert" data-refusal={result.refusal}>
          <p className="text-2xl uppercase tracking-widest text-slate-300">Fitframe · studio screen</p>
          <h1 className="mt-4 text-5xl font-semibold leading-tight">{STUDIO_SCREEN_REFUSALS[result.refusal]}</h1>
        </div>
      </main>
    );
  }
  return <StudioScreen fittingId={fittingId} token={token} initial={JSON.parse(JSON.stringify({ ...result.session, expiresAt: result.expiresAt }))} />;
}
