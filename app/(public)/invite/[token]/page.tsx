import type { Metadata } from "next";
import Link from "next/link";
import { AcceptInvitationForm } from "@/components/invitations/accept-form";
import { PrivacyNote } from "@/components/layout/privacy-note";
import { describeInvitation } from "@/lib/server/dal/invitations";

export const metadata: Metadata = { title: "Your invitation", referrer: "no-referrer" };

const refusals = {
  unknown: "This invitation link is not valid. Check that you opened the whole link from the e-mail.",
  used: "This invitation has already been used.",
  expired: "This invitation has expired. Ask the studio to send a new one.",
} as const;

export default async function InvitePage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const invitation = await describeInvitation(token);
  return (
    <main className="mx-auto flex min-h-screen max-w-sm flex-col justify-center gap-6 p-6">
      <div>
        <p className="text-label font-semibold uppercase tracking-widest text-signal-dark">Fitframe</p>
        <h1 className="mt-1 text-title">{invitation.state === "valid" ? `Welcome, ${invitation.name}` : "Invitation"}</h1>
      </div>
      {invitation.state === "valid" ? (
        <>
          <p className="text-slate-700">Choose a password for <span className="font-medium">{invitation.email}</span>.</p>
          <AcceptInvitationForm token={token} email={invitation.email} />
        </>
      ) : (
        <p role="alert" className="rounded-card border border-signal bg-signal-light px-3 py-2">
          {refusals[invitation.state]} <Link href="/sign-in" className="underline">Sign in</Link>
        </p>
      )}
      <PrivacyNote />
    </main>
  );
}
