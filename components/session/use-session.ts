"use client";

import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { apiFetch } from "@/lib/client/api";
import { SESSION_POLL_MS } from "@/lib/config/session";
import type { SessionData } from "./types";

/**
 * The live session by TanStack Query polling (docs/api.md, "Live session"): every 750 ms while the
 * tab is visible, so a putt shows within a second of its upload starting. Polling rather than
 * server-sent events: no long-lived connection per screen for the web processes to hold, and it
 * works the same behind any load balancer; its cost is one small read per screen per 0.75 s.
 */
export function useSession(fittingId: string) {
  return useQuery({
    queryKey: ["session", fittingId],
    queryFn: ({ signal }) => apiFetch<SessionData>(`/api/fittings/${fittingId}/session`, { signal }),
    refetchInterval: SESSION_POLL_MS,
    staleTime: 0,
  });
}

/** A change to the session (recording build, a putt's build, mishit, delete): the list reloads at once after it. */
export function useSessionChange<T>(fittingId: string, change: (input: T) => Promise<unknown>) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: change,
    onSettled: () => Promise.all([
      client.invalidateQueries({ queryKey: ["session", fittingId] }),
      client.invalidateQueries({ queryKey: ["comparison", fittingId] }),
      client.invalidateQueries({ queryKey: ["clips", fittingId] }),
    ]),
  });
}
