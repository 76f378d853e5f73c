"use client";
// Step 3 for a visitor: sign in, or create a golfer account at this studio and sign in with it.
import { signIn } from "next-auth/react";
import { useState } from "react";
import { useFormSubmit } from "@/components/forms/use-form-submit";
import { apiFetch } from "@/lib/client/api";

export function AccountStep({ slug, onSignedIn }: { slug: string; onSignedIn: (email: string) => void }) {
  const [mode, setMode] = useState<"new" | "existing">("new");
  const { onSubmit, pending, error } = useFormSubmit(async (form) => {
    const email = String(form.get("email") ?? "");
    const password = String(form.get("password") ?? "");
    if (mode === "new") await apiFetch(`/api/booking/studios/${slug}/accounts`, { method: "POST", body: { name: form.get("name"), email, password } });
    const result = await signIn("credentials", { email, password, redirect: false });
    if (!result?.ok || result.error) throw new Error("That e-mail and password do not match an account.");
    onSignedIn(email);
  });

  return (
    <section className="card" aria-labelledby="account-heading">
      <h2 id="account-heading" className="field-label">3 · Your account</h2>
      <div className="mb-4 flex gap-2">
        <button type="button" className={mode === "new" ? "btn-primary" : "btn-quiet"} onClick={() => setMode("new")}>I am new here</button>
        <button type="button" className={mode === "existing" ? "btn-primary" : "btn-quiet"} onClick={() => setMode("existing")}>I have an account</button>
      </div>
      <form onSubmit={onSubmit} className="flex flex-col gap-3" noValidate>
        {mode === "new" && (
          <div>
            <label htmlFor="acct-name" className="field-label">Name</label>
            <input id="acct-name" name="name" required className="field" autoComplete="name" />
          </div>
        )}
        <div>
          <label htmlFor="acct-email" className="field-label">E-mail</label>
          <input id="acct-email" name="email" type="email" required className="field" autoComplete="username" />
        </div>
        <div>
          <label htmlFor="acct-password" className="field-label">Password {mode === "new" && "(at least 10 characters)"}</label>
          <input id="acct-password" name="password" type="password" required className="field" autoComplete={mode === "new" ? "new-password" : "current-password"} />
        </div>
        {error && <p role="alert" className="field-error">{error}</p>}
        <button type="submit" className="btn-primary" disabled={pending}>{mode === "new" ? "Create account and continue" : "Sign in and continue"}</button>
      </form>
    </section>
  );
}
