"use client";

import { useState, type FormEvent } from "react";
import { apiFetch, ApiClientError } from "@/lib/client/api";

type Props = { golferId: string; role: "golfer" | "coach"; defaultEmail?: string; onSent?: () => void };

/** Sends an invitation by e-mail: the golfer's own account, or a coach who will have this golfer. */
export function InviteForm({ golferId, role, defaultEmail, onSent }: Props) {
  const [state, setState] = useState<{ kind: "idle" | "pending" | "sent" } | { kind: "error"; message: string }>({ kind: "idle" });
  const id = `invite-${role}`;

  async function onSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const form = new FormData(event.currentTarget);
    const name = String(form.get("name") ?? "").trim();
    setState({ kind: "pending" });
    try {
      await apiFetch("/api/invitations", { method: "POST", body: { role, golferId, email: String(form.get("email") ?? ""), ...(name ? { name } : {}) } });
      setState({ kind: "sent" });
      onSent?.();
    } catch (err) {
      setState({ kind: "error", message: err instanceof ApiClientError ? err.message : "Sending failed." });
    }
  }

  return (
    <form onSubmit={onSubmit} className="flex flex-col gap-3" noValidate aria-label={role === "golfer" ? "Invite the golfer" : "Invite a coach"}>
      {role === "coach" && (
        <div>
          <label htmlFor={`${id}-name`} className="field-label">Coach&apos;s name</label>
          <input id={`${id}-name`} name="name" className="field" required />
        </div>
      )}
      <div>
        <label htmlFor={`${id}-email`} className="field-label">{role === "golfer" ? "Golfer's e-mail" : "Coach's e-mail"}</label>
        <input id={`${id}-email`} name="email" type="email" defaultValue={defaultEmail} className="field" required aria-describedby={state.kind === "error" ? `${id}-error` : undefined} />
      </div>
      {state.kind === "error" && <p id={`${id}-error`} role="alert" className="field-error">{state.message}</p>}
      {state.kind === "sent" && <p role="status" className="text-label text-slate-700">Invitation sent. The link works once, for 7 days.</p>}
      <button type="submit" className="btn-quiet self-start" disabled={state.kind === "pending"}>
        {role === "golfer" ? "Send the golfer an invitation" : "Invite the coach"}
      </button>
    </form>
  );
}
