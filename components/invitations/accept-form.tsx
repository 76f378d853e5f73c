"use client";

import { signIn } from "next-auth/react";
import { useRouter } from "next/navigation";
import { useState, type FormEvent } from "react";
import { apiFetch, ApiClientError } from "@/lib/client/api";

/** Sets the password with the invitation's token, then signs the new account in. */
export function AcceptInvitationForm({ token, email }: { token: string; email: string }) {
  const router = useRouter();
  const [error, setError] = useState<string | null>(null);
  const [pending, setPending] = useState(false);

  async function onSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const form = new FormData(event.currentTarget);
    const password = String(form.get("password") ?? "");
    if (password !== String(form.get("confirm") ?? "")) return setError("The two passwords differ.");
    setPending(true);
    setError(null);
    try {
      const { home } = await apiFetch<{ home: string }>("/api/invitations/accept", { method: "POST", body: { token, password } });
      const result = await signIn("credentials", { email, password, redirect: false });
      if (!result?.ok || result.error) throw new Error("Your account is ready, but signing in failed. Try the sign-in page.");
      router.replace(home);
      router.refresh();
    } catch (err) {
      setError(err instanceof ApiClientError || err instanceof Error ? err.message : "Something went wrong.");
      setPending(false);
    }
  }

  return (
    <form onSubmit={onSubmit} className="flex flex-col gap-4" noValidate>
      <div>
        <label htmlFor="password" className="field-label">New password</label>
        <input id="password" name="password" type="password" autoComplete="new-password" minLength={10} required className="field" aria-describedby="password-hint" />
        <p id="password-hint" className="mt-1 text-label text-slate-600">At least 10 characters.</p>
      </div>
      <div>
        <label htmlFor="confirm" className="field-label">Repeat the password</label>
        <input id="confirm" name="confirm" type="password" autoComplete="new-password" required className="field" aria-describedby={error ? "accept-error" : undefined} />
      </div>
      {error && <p id="accept-error" role="alert" className="rounded-card border border-signal bg-signal-light px-3 py-2">{error}</p>}
      <button type="submit" className="btn-primary" disabled={pending}>{pending ? "Setting up…" : "Set password and sign in"}</button>
    </form>
  );
}
