"use client";

import { useQueryClient } from "@tanstack/react-query";
import { useCallback, useRef, useState } from "react";
import { apiFetch } from "@/lib/client/api";
import { putWithProgress } from "@/lib/client/put-with-progress";

export type UploadTarget = { fittingId: string; buildId: string; view: string; captureFps: number; consentConfirmed: boolean; strokeId?: string };
export type UploadItem = {
  key: string;
  file: File;
  target: UploadTarget;
  status: "waiting" | "uploading" | "done" | "failed" | "cancelled";
  fraction: number;
  error?: string;
};

const PARALLEL = 2;

/** The files dropped on the panel: each goes straight to the store, two at a time. */
export function useClipUploads(fittingId: string) {
  const queryClient = useQueryClient();
  const [items, setItems] = useState<UploadItem[]>([]);
  const aborts = useRef(new Map<string, () => void>());
  const active = useRef(0);
  const queue = useRef<UploadItem[]>([]);

  const patch = useCallback((key: string, change: Partial<UploadItem>) => {
    setItems((all) => all.map((i) => (i.key === key ? { ...i, ...change } : i)));
  }, []);

  const run = useCallback(
    async (item: UploadItem) => {
      active.current++;
      patch(item.key, { status: "uploading", fraction: 0, error: undefined });
      try {
        const { clip, upload } = await apiFetch<{ clip: { id: string }; upload: { url: string; headers: Record<string, string> } }>("/api/clips", {
          method: "POST",
          body: { ...item.target, fileName: item.file.name, contentType: item.file.type || "video/mp4", sizeBytes: item.file.size },
        });
        const put = putWithProgress(upload.url, item.file, upload.headers, (fraction) => patch(item.key, { fraction }));
        aborts.current.set(item.key, put.abort);
        await put.done;
        await apiFetch(`/api/clips/${clip.id}/complete`, { method: "POST" });
        patch(item.key, { status: "done", fraction: 1 });
      } catch (err) {
        const cancelled = err instanceof DOMException && err.name === "AbortError";
        patch(item.key, { status: cancelled ? "cancelled" : "failed", error: cancelled ? undefined : (err as Error).message });
      } finally {
        aborts.current.delete(item.key);
        active.current--;
        void queryClient.invalidateQueries({ queryKey: ["clips", fittingId] });
        const next = queue.current.shift();
        if (next) void run(next);
      }
    },
    [fittingId, patch, queryClient],
  );

  const start = useCallback(
    (item: UploadItem) => (active.current < PARALLEL ? void run(item) : queue.current.push(item)),
    [run],
  );

  const add = useCallback(
    (files: File[], target: UploadTarget) => {
      const added = files.map((file) => ({ key: `${file.name}-${file.size}-${crypto.randomUUID()}`, file, target, status: "waiting" as const, fraction: 0 }));
      setItems((all) => [...all, ...added]);
      added.forEach(start);
    },
    [start],
  );

  const cancel = useCallback((key: string) => {
    aborts.current.get(key)?.();
    queue.current = queue.current.filter((i) => i.key !== key);
    patch(key, { status: "cancelled" });
  }, [patch]);

  const retry = useCallback((item: UploadItem) => start({ ...item, status: "waiting" }), [start]);

  return { items, add, cancel, retry };
}
