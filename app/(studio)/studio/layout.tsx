import Link from "next/link";
import { notFound } from "next/navigation";
import { SignOutButton } from "@/components/auth/sign-out-button";
import { requirePageActor } from "@/lib/server/page-actor";
import { getOwnStudio } from "@/lib/server/dal/studio";

export default async function StudioLayout({ children }: { children: React.ReactNode }) {
  const actor = await requirePageActor();
  if (actor.role === "golfer") notFound();
  const studio = await getOwnStudio(actor);
  return (
    <div className="min-h-screen">
      <header className="border-b border-chalk-300 bg-white print:hidden">
        <nav className="mx-auto flex max-w-6xl items-center gap-6 px-6 py-3" aria-label="Studio">
          <Link href="/studio" className="font-semibold tracking-tight">
            <span className="text-signal-dark">Fitframe</span> · {studio.name}
          </Link>
          <Link href="/studio/golfers" className="text-slate-700 hover:text-ink">Golfers</Link>
          {actor.role === "admin" && <Link href="/studio/settings" className="text-slate-700 hover:text-ink">Settings</Link>}
          <span className="ml-auto text-label text-slate-600">
            {actor.name} · {actor.role}
          </span>
          <SignOutButton />
        </nav>
      </header>
      <main className="mx-auto max-w-6xl px-6 py-8">{children}</main>
    </div>
  );
}
