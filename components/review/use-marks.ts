"use client";

import { useQueryClient } from "@tanstack/react-query";
import { useCallback, useEffect, useRef, useState } from "react";
import { apiFetch, ApiClientError } from "@/lib/client/api";
import { emptyHistory, record, redo, renameMark, undo, type Command, type History } from "@/lib/review/history";
import { createBody, fieldsOf, movedByHand, patchBody, replaceMark, withoutMark, type MarkFields, type ReviewMark } from "@/lib/review/marks";
import type { MarkDraft } from "@/lib/review/tools";
import { measurementsKey, showMeasurements } from "./measurements-cache";
import type { MeasurementsReply } from "./types";

export const CONFLICT_MESSAGE = "This clip was changed in another window — reloaded the latest marks";

// Writes answer with the mark and the clip's recomputed measurements.
type Saved = { mark: ReviewMark; measurements: MeasurementsReply["measurements"] };
type Deleted = { deleted: string; measurements: MeasurementsReply["measurements"] };

export type Notice = { tone: "conflict" | "error" | "info"; text: string } | null;

/**
 * The clip's marks, saved as they change: every edit goes to the API in order (one queue),
 * with the mark's version; a stale version (409) reloads the marks and says so. Each saved
 * edit is recorded as plain before/after data; undo and redo save the inverse the same way.
 */
export function useMarks(clipId: string) {
  const queryClient = useQueryClient();
  const base = `/api/clips/${clipId}/marks`;
  const [marks, setMarksState] = useState<ReviewMark[]>([]);
  const [history, setHistoryState] = useState<History>(emptyHistory);
  const [pending, setPending] = useState(0);
  const [notice, setNotice] = useState<Notice>(null);
  const [loaded, setLoaded] = useState(false);
  const marksRef = useRef<ReviewMark[]>([]);
  const historyRef = useRef<History>(emptyHistory());
  const queue = useRef<Promise<void>>(Promise.resolve());

  const setMarks = useCallback((next: ReviewMark[]) => {
    marksRef.current = next;
    setMarksState(next);
  }, []);
  const setHistory = useCallback((next: History) => {
    historyRef.current = next;
    setHistoryState(next);
  }, []);

  const reload = useCallback(async () => {
    const data = await apiFetch<{ marks: ReviewMark[] }>(base);
    setMarks(data.marks);
  }, [base, setMarks]);

  useEffect(() => {
    let live = true;
    apiFetch<{ marks: ReviewMark[] }>(base)
      .then((data) => {
        if (!live) return;
        setMarks(data.marks);
        setLoaded(true);
      })
      .catch((err: Error) => live && setNotice({ tone: "error", text: `Could not load the marks: ${err.message}` }));
    return () => {
      live = false;
    };
  }, [base, setMarks]);

  const enqueue = useCallback(
    (work: () => Promise<void>) => {
      setPending((n) => n + 1);
      queue.current = queue.current
        .then(work)
        .catch(async (err: unknown) => {
          const stale = err instanceof ApiClientError && (err.status === 409 || err.status === 404);
          setNotice(stale ? { tone: "conflict", text: CONFLICT_MESSAGE } : { tone: "error", text: err instanceof Error ? err.message : String(err) });
          // After someone else's change, undoing ours could silently revert theirs: start a fresh history.
          if (stale) setHistory(emptyHistory());
          await reload().catch(() => undefined);
          await queryClient.invalidateQueries({ queryKey: measurementsKey(clipId) });
        })
        .finally(() => setPending((n) => n - 1));
    },
    [clipId, queryClient, reload, setHistory],
  );

  const current = (id: string) => {
    const m = marksRef.current.find((x) => x.id === id);
    if (!m) throw new ApiClientError(404, "not_found", "That mark is gone");
    return m;
  };

  const post = async (m: Omit<ReviewMark, "id" | "version">) => {
    const reply = await apiFetch<Saved>(base, { method: "POST", body: createBody(m) });
    setMarks([...marksRef.current, reply.mark]);
    showMeasurements(queryClient, clipId, reply); // the answer carries them: no second request
    return reply.mark;
  };
  const patch = async (id: string, fields: Partial<MarkFields>) => {
    const reply = await apiFetch<Saved>(`${base}/${id}`, { method: "PATCH", body: patchBody(current(id).version, fields) });
    setMarks(replaceMark(marksRef.current, reply.mark));
    showMeasurements(queryClient, clipId, reply);
    return reply.mark;
  };
  const remove = async (id: string) => {
    const reply = await apiFetch<Deleted>(`${base}/${id}?version=${current(id).version}`, { method: "DELETE" });
    setMarks(withoutMark(marksRef.current, id));
    showMeasurements(queryClient, clipId, reply);
  };

  /** Saves a command's effect; returns the new id when a mark was created again. */
  const apply = async (c: Command): Promise<{ from: string; to: string } | null> => {
    if (c.type === "create") return { from: c.mark.id, to: (await post(c.mark)).id };
    if (c.type === "delete") await remove(c.mark.id);
    else await patch(c.id, c.after);
    return null;
  };

  const create = (draft: MarkDraft) =>
    enqueue(async () => {
      const saved = await post(draft);
      setHistory(record(historyRef.current, { type: "create", mark: saved }));
    });

  const update = (id: string, fields: Partial<MarkFields>) => {
    const before = marksRef.current.find((m) => m.id === id);
    if (!before) return;
    setMarks(replaceMark(marksRef.current, movedByHand(before, fields))); // shown at once, saved in turn
    enqueue(async () => {
      const saved = await patch(id, fields);
      setHistory(record(historyRef.current, { type: "update", id, before: fieldsOf(before), after: fieldsOf(saved) }));
    });
  };

  const destroy = (id: string) => {
    const before = marksRef.current.find((m) => m.id === id);
    if (!before) return;
    enqueue(async () => {
      await remove(id);
      setHistory(record(historyRef.current, { type: "delete", mark: before }));
    });
  };

  const step = (direction: "undo" | "redo") =>
    enqueue(async () => {
      const next = direction === "undo" ? undo(historyRef.current) : redo(historyRef.current);
      if (!next) return;
      const renamed = await apply(next.apply);
      setHistory(renamed ? renameMark(next.history, renamed.from, renamed.to) : next.history);
    });

  return {
    marks,
    /** True once the clip's marks have come from the server. */
    loaded,
    history,
    saving: pending > 0,
    notice,
    dismissNotice: () => setNotice(null),
    report: (text: string) => setNotice({ tone: "error", text }),
    inform: (text: string) => setNotice({ tone: "info", text }),
    /** After a change made elsewhere (tracking accepted or run again): the server's marks, queued behind pending saves. */
    reload: () => enqueue(reload),
    /**
     * Runs another write that changes the measurements (a moment) in the same queue, so replies
     * arrive in the order the edits were made and an older answer never replaces a newer one.
     * `work` handles its own errors.
     */
    inTurn: (work: () => Promise<void>) => enqueue(work),
    create,
    update,
    destroy,
    undo: () => step("undo"),
    redo: () => step("redo"),
  };
}
