"use client";

import { signIn } from "next-auth/react";
import { useRouter, useSearchParams } from "next/navigation";
import { useFormSubmit } from "@/components/forms/use-form-submit";

const messages: Record<string, string> = {
  CredentialsSignin: "That e-mail and password do not match an account.",
  AccountDisabled: "This account is disabled. Ask your studio's admin.",
  RateLimited: "Too many failed sign-ins. Wait 15 minutes and try again.",
};

export function SignInForm() {
  const router = useRouter();
  const params = useSearchParams();
  const initial = params.get("error");
  const { onSubmit, pending, error } = useFormSubmit(
    async (form) => {
      const result = await signIn("credentials", { email: form.get("email"), password: form.get("password"), redirect: false });
      if (!result?.ok || result.error) throw new Error(messageFor(result?.error ?? (result?.status === 429 ? "RateLimited" : "CredentialsSignin")));
      router.replace("/");
      router.refresh();
    },
    { initialError: initial ? messageFor(initial) : null },
  );

  return (
    <form onSubmit={onSubmit} className="flex flex-col gap-4" noValidate>
      <div>
        <label htmlFor="email" className="field-label">E-mail</label>
        <input id="email" name="email" type="email" autoComplete="username" required className="field" aria-describedby={error ? "sign-in-error" : undefined} />
      </div>
      <div>
        <label htmlFor="password" className="field-label">Password</label>
        <input id="password" name="password" type="password" autoComplete="current-password" required className="field" aria-describedby={error ? "sign-in-error" : undefined} />
      </div>
      {error && (
        <p id="sign-in-error" role="alert" className="rounded-card border border-signal bg-signal-light px-3 py-2 text-ink">
          {error}
        </p>
      )}
      <button type="submit" className="btn-primary" disabled={pending}>{pending ? "Signing in…" : "Sign in"}</button>
    </form>
  );
}

function messageFor(code: string): string {
  return messages[code] ?? "Sign-in failed. Check your e-mail and password.";
}
