"use client";
// The clip's comment threads under the player: tap a thread's time to jump there; reply;
// resolve; write a new comment at the current frame. Text is rendered as text (never HTML).
import { useQuery, useQueryClient } from "@tanstack/react-query";
import { useEffect, useId, useState, type FormEvent } from "react";
import { apiFetch, ApiClientError } from "@/lib/client/api";
import { formatCaptureTime } from "@/lib/playback/timing";

export type Comment = { id: string; parentId: string | null; frame: number; body: string; resolvedAt: string | null; createdAt: string; author: { id: string; name: string; role: string } | null };
export type Thread = Comment & { replies: Comment[] };
export type CommentList = { captureFps: number; threads: Thread[] };
export type Viewer = { userId: string; role: string };

const MAX = 4000;
const staff = (v: Viewer) => v.role === "admin" || v.role === "fitter";
export const commentsKey = (clipId: string) => ["clip-comments", clipId];

function Composer({ label, submit, placeholder }: { label: string; submit: (body: string) => Promise<void>; placeholder: string }) {
  const [error, setError] = useState<string | null>(null);
  const [pending, setPending] = useState(false);
  const id = useId();
  async function onSubmit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const form = e.currentTarget;
    const body = String(new FormData(form).get("body") ?? "");
    if (!body.trim()) return setError("Write something first.");
    setPending(true);
    setError(null);
    try {
      await submit(body);
      form.reset();
    } catch (err) {
      setError(err instanceof ApiClientError ? err.message : "Sending failed.");
    } finally {
      setPending(false);
    }
  }
  return (
    <form onSubmit={onSubmit} className="flex flex-col gap-2" noValidate>
      <label className="field-label" htmlFor={id}>{label}</label>
      <textarea id={id} name="body" rows={2} maxLength={MAX} className="field" placeholder={placeholder} />
      {error && <p role="alert" className="field-error">{error}</p>}
      <button type="submit" className="btn-primary self-end" disabled={pending}>{pending ? "Sending…" : "Send"}</button>
    </form>
  );
}

export function CommentThreads({ clipId, initial, viewer, frame, onSeek }: { clipId: string; initial: CommentList; viewer: Viewer; frame: number; onSeek: (frame: number) => void }) {
  const client = useQueryClient();
  const { data = initial } = useQuery({ queryKey: commentsKey(clipId), queryFn: () => apiFetch<CommentList>(`/api/clips/${clipId}/comments`), initialData: initial });
  useEffect(() => {
    void apiFetch(`/api/clips/${clipId}/comments/read`, { method: "POST" }).catch(() => undefined);
  }, [clipId, data.threads.length]);
  const refresh = () => client.invalidateQueries({ queryKey: commentsKey(clipId) });
  const send = async (body: unknown) => {
    await apiFetch(`/api/clips/${clipId}/comments`, { method: "POST", body });
    await refresh();
  };
  const resolve = async (id: string, resolved: boolean) => {
    await apiFetch(`/api/comments/${id}`, { method: "PATCH", body: { resolved } });
    await refresh();
  };
  const time = (n: number) => formatCaptureTime(n, data.captureFps);

  return (
    <section aria-labelledby="comments-heading" className="flex flex-col gap-4">
      <h2 id="comments-heading" className="field-label">Comments</h2>
      {data.threads.length === 0 && <p className="text-slate-600">No comments yet.</p>}
      <ol className="flex flex-col gap-3">
        {data.threads.map((t) => (
          <li key={t.id} className={`card p-3 ${t.resolvedAt ? "opacity-70" : ""}`} data-testid="comment-thread" data-frame={t.frame}>
            <div className="flex items-center justify-between gap-2">
              <button type="button" className="btn-quiet num min-w-0 px-3" onClick={() => onSeek(t.frame)} aria-label={`Go to ${time(t.frame)}, frame ${t.frame}`}>
                {time(t.frame)} · {t.frame}
              </button>
              {(staff(viewer) || t.author?.id === viewer.userId) && (
                <button type="button" className="btn-quiet px-3" onClick={() => void resolve(t.id, !t.resolvedAt)}>{t.resolvedAt ? "Reopen" : "Resolve"}</button>
              )}
            </div>
            {[t, ...t.replies].map((c) => (
              <div key={c.id} className={c.parentId ? "mt-2 border-l-2 border-chalk-300 pl-3" : "mt-2"}>
                <p className="text-label text-slate-600">{c.author?.name ?? "Former member"} · {c.author?.role ?? ""}</p>
                <p className="whitespace-pre-wrap break-words" data-testid="comment-body">{c.body}</p>
              </div>
            ))}
            {t.resolvedAt && <p className="mt-2 text-label text-slate-600">Resolved</p>}
            <details className="mt-2">
              <summary className="flex min-h-touch cursor-pointer items-center text-slate-700">Reply</summary>
              <Composer label="Your reply" placeholder="Your reply" submit={(body) => send({ parentId: t.id, body })} />
            </details>
          </li>
        ))}
      </ol>
      <Composer label={`Comment at ${time(frame)} (frame ${frame})`} placeholder="What do you see at this moment?" submit={(body) => send({ frame, body })} />
    </section>
  );
}
