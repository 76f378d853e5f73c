// Unread comments on the person's home: a count and the clips they are on (server component).
import Link from "next/link";
import type { SignedInActor } from "@/lib/server/access";
import { unreadSummary } from "@/lib/server/dal/comment-unread";

const viewWords: Record<string, string> = { overhead: "Overhead", "face-on": "Face-on", "down-the-line": "Down the line" };

function clipHref(actor: SignedInActor, clipId: string) {
  if (actor.role === "golfer") return `/me/clips/${clipId}`;
  if (actor.role === "coach") return `/studio/coach/clips/${clipId}`;
  return `/studio/clips/${clipId}`;
}

export async function UnreadSummary({ actor }: { actor: SignedInActor }) {
  const { total, clips } = await unreadSummary(actor, 5);
  return (
    <section className="card" aria-labelledby="unread-heading" data-testid="unread-summary" data-unread={total}>
      <h2 id="unread-heading" className="field-label">New comments</h2>
      {total === 0 ? <p className="text-slate-600">No unread comments.</p> : (
        <>
          <p className="mb-2"><span className="num font-semibold">{total}</span> unread comment{total === 1 ? "" : "s"}</p>
          <ul className="divide-y divide-chalk-200">
            {clips.map((c) => (
              <li key={c.clipId}>
                <Link href={clipHref(actor, c.clipId)} className="flex min-h-touch items-center justify-between gap-3">
                  <span>{actor.role === "golfer" ? "" : `${c.golferName} · `}{viewWords[c.view] ?? c.view} · {c.buildLabel}</span>
                  <span className="num rounded-full bg-signal-dark px-2 text-label text-white">{c.unread}</span>
                </Link>
              </li>
            ))}
          </ul>
        </>
      )}
    </section>
  );
}
