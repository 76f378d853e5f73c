import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { Suspense } from "react";
import { SignInForm } from "@/components/auth/sign-in-form";
import { PrivacyNote } from "@/components/layout/privacy-note";
import { currentActor } from "@/lib/server/auth/actor";

export const metadata: Metadata = { title: "Sign in" };

export default async function SignInPage() {
  if (await currentActor()) redirect("/");
  return (
    <main className="mx-auto flex min-h-screen max-w-sm flex-col justify-center gap-8 p-6">
      <div>
        <p className="text-label font-semibold uppercase tracking-widest text-signal-dark">Fitframe</p>
        <h1 className="mt-1 text-title">Sign in to your studio</h1>
      </div>
      <Suspense>
        <SignInForm />
      </Suspense>
      <PrivacyNote />
    </main>
  );
}
