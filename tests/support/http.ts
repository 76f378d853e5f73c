// A small client for the real HTTP API: sign in like a browser (next-auth credentials flow)
// or use a Bearer token, then call routes and read `{ status, body }`.
export const BASE = process.env.TEST_BASE_URL ?? "http://127.0.0.1:3100";

export type Auth = { cookie?: string; token?: string } | null;
// eslint-disable-next-line @typescript-eslint/no-explicit-any -- tests read arbitrary JSON answers
export type Reply = { status: number; body: any; headers: Headers };

function cookiesFrom(res: Response, jar: Map<string, string>) {
  for (const line of res.headers.getSetCookie()) {
    const [pair] = line.split(";");
    const eq = pair!.indexOf("=");
    jar.set(pair!.slice(0, eq).trim(), pair!.slice(eq + 1));
  }
}
const jarString = (jar: Map<string, string>) => [...jar].map(([k, v]) => `${k}=${v}`).join("; ");

/** Signs in with e-mail and password; returns the session cookie header, or the failure. */
export async function signIn(email: string, password: string): Promise<{ cookie: string | null; status: number; error: string | null }> {
  const jar = new Map<string, string>();
  const csrfRes = await fetch(`${BASE}/api/auth/csrf`);
  cookiesFrom(csrfRes, jar);
  const { csrfToken } = (await csrfRes.json()) as { csrfToken: string };
  const res = await fetch(`${BASE}/api/auth/callback/credentials`, {
    method: "POST",
    redirect: "manual",
    headers: { "content-type": "application/x-www-form-urlencoded", cookie: jarString(jar), origin: BASE },
    body: new URLSearchParams({ csrfToken, email, password, json: "true" }),
  });
  cookiesFrom(res, jar);
  const body = (await res.json().catch(() => ({}))) as { url?: string };
  const error = body.url ? new URL(body.url).searchParams.get("error") : null;
  const signedIn = [...jar.keys()].some((k) => k.endsWith("next-auth.session-token"));
  return { cookie: signedIn && !error ? jarString(jar) : null, status: res.status, error };
}

export async function call(auth: Auth, method: string, path: string, body?: unknown, extraHeaders: Record<string, string> = {}): Promise<Reply> {
  const headers: Record<string, string> = { origin: BASE, ...extraHeaders };
  if (auth?.cookie) headers.cookie = auth.cookie;
  if (auth?.token) headers.authorization = `Bearer ${auth.token}`;
  let payload: string | undefined;
  if (body !== undefined) {
    headers["content-type"] = "application/json";
    payload = typeof body === "string" ? body : JSON.stringify(body);
  }
  const res = await fetch(`${BASE}${path}`, { method, headers, body: payload, redirect: "manual" });
  const text = await res.text();
  let parsed: unknown = text;
  try {
    parsed = text ? JSON.parse(text) : null;
  } catch {
    /* not JSON: keep the text */
  }
  return { status: res.status, body: parsed, headers: res.headers };
}
