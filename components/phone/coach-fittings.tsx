// The coach's home list: fittings of the golfers shared with it, each opening its clips.
import Link from "next/link";
import type { SignedInActor } from "@/lib/server/access";
import { listCoachFittings } from "@/lib/server/dal/golfer-clips";

export async function CoachFittings({ actor }: { actor: SignedInActor }) {
  const rows = await listCoachFittings(actor);
  return (
    <section className="card" aria-labelledby="coach-fittings-heading">
      <h2 id="coach-fittings-heading" className="field-label">Clips to review</h2>
      {rows.length === 0 ? <p className="text-slate-600">No fittings shared with you yet.</p> : (
        <ul className="divide-y divide-chalk-200">
          {rows.map((f) => (
            <li key={f.id}>
              <Link href={`/studio/coach/fittings/${f.id}`} className="flex min-h-touch items-center justify-between gap-3">
                <span>{f.golferName}</span>
                <span className="num text-label text-slate-600">{f.scheduledAt.toLocaleDateString("en-GB", { day: "numeric", month: "short", year: "numeric" })}</span>
              </Link>
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}
