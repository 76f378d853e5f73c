// The browser's one way to call our API: JSON in, JSON out, errors thrown as ApiClientError
// with the server's code and message (shown to the person as they are).
export class ApiClientError extends Error {
  constructor(public readonly status: number, public readonly code: string, message: string, public readonly issues?: { path: string; message: string }[]) {
    super(message);
  }
}

export async function apiFetch<T>(path: string, init: { method?: string; body?: unknown; signal?: AbortSignal } = {}): Promise<T> {
  const res = await fetch(path, {
    method: init.method ?? "GET",
    headers: init.body === undefined ? undefined : { "content-type": "application/json" },
    body: init.body === undefined ? undefined : JSON.stringify(init.body),
    signal: init.signal,
    credentials: "same-origin",
  });
  if (res.status === 204) return undefined as T;
  const data = await res.json().catch(() => null);
  if (!res.ok) {
    const error = (data as { error?: { code?: string; message?: string; issues?: { path: string; message: string }[] } } | null)?.error;
    throw new ApiClientError(res.status, error?.code ?? "http_error", error?.message ?? `Request failed (${res.status})`, error?.issues);
  }
  return data as T;
}
