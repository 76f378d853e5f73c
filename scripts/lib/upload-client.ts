// The capture computer's side of the clip API: register a file (with its SHA-256, so that the
// server answers a file it already has with that clip), send it to the store by the presigned
// URL, and complete it. Every step is retried with back-off on a dropped connection; since the
// registration is keyed by the hash, the whole sequence can be repeated without a second clip.
import { createHash } from "node:crypto";
import { createReadStream } from "node:fs";
import { stat } from "node:fs/promises";
import http from "node:http";
import https from "node:https";
import path from "node:path";
import { setTimeout as sleep } from "node:timers/promises";

export const CONTENT_TYPES: Record<string, string> = {
  ".mp4": "video/mp4", ".m4v": "video/mp4", ".mov": "video/quicktime", ".avi": "video/x-msvideo", ".mkv": "video/x-matroska",
};

export const contentTypeOf = (file: string) => CONTENT_TYPES[path.extname(file).toLowerCase()] ?? "application/octet-stream";

/** A failed call: `status` is absent when the connection itself failed. */
export class UploadError extends Error {
  constructor(message: string, readonly status?: number) {
    super(message);
  }
  /** Worth another try: the network, the server's or the store's trouble, or an upload not yet seen. */
  get retryable() {
    return this.status === undefined || this.status >= 500 || this.status === 429 || this.status === 409;
  }
}

export type Clip = { id: string; buildId: string; view: string; state: string; originalName: string; failureReason: string | null };
type Upload = { method: "PUT"; url: string; headers: Record<string, string> };
/** `duplicate`: the fitting had the file already; `sent`: its bytes went up in this call (a fresh clip, or one whose upload had broken off). */
export type SendResult = { clip: Clip; duplicate: boolean; sent: boolean };

/** Exponential back-off, 0.5 s doubling up to 30 s; gives up after `attempts` or on a non-retryable error. */
export async function withRetry<T>(what: string, work: () => Promise<T>, attempts = 8, log: (line: string) => void = console.error): Promise<T> {
  for (let attempt = 1; ; attempt++) {
    try {
      return await work();
    } catch (err) {
      const failure = err instanceof UploadError ? err : new UploadError((err as Error).message);
      if (!failure.retryable || attempt >= attempts) throw failure;
      const waitMs = Math.min(30_000, 500 * 2 ** (attempt - 1));
      log(`${what}: ${failure.message}; trying again in ${(waitMs / 1000).toFixed(1)} s`);
      await sleep(waitMs);
    }
  }
}

export function apiClient(baseUrl: string, token: string) {
  return async function api<T = unknown>(method: string, route: string, body?: unknown): Promise<T> {
    let res: Response;
    try {
      res = await fetch(`${baseUrl}${route}`, {
        method,
        headers: { authorization: `Bearer ${token}`, ...(body ? { "content-type": "application/json" } : {}) },
        body: body ? JSON.stringify(body) : undefined,
      });
    } catch (err) {
      throw new UploadError(`${method} ${route}: ${(err as Error).cause ?? (err as Error).message}`);
    }
    const data = await res.json().catch(() => null);
    if (!res.ok) throw new UploadError(data?.error?.message ?? `${method} ${route}: ${res.status}`, res.status);
    return data as T;
  };
}
export type Api = ReturnType<typeof apiClient>;

export async function sha256OfFile(file: string): Promise<string> {
  const hash = createHash("sha256");
  for await (const chunk of createReadStream(file)) hash.update(chunk as Buffer);
  return hash.digest("hex");
}

/** Streams the file to a presigned URL with an exact Content-Length (the store refuses chunked bodies). */
function putFile(upload: Upload, file: string, size: number): Promise<void> {
  const url = new URL(upload.url);
  const client = url.protocol === "https:" ? https : http;
  return new Promise((resolve, reject) => {
    const req = client.request(url, { method: "PUT", headers: { ...upload.headers, "content-length": String(size) } }, (res) => {
      res.resume();
      res.on("end", () => {
        const status = res.statusCode ?? 0;
        if (status >= 200 && status < 300) resolve();
        else reject(new UploadError(`the store refused ${path.basename(file)}: ${status}`, status === 403 ? 409 : status));
      });
    });
    req.on("error", (err) => reject(new UploadError(`sending ${path.basename(file)}: ${err.message}`)));
    createReadStream(file).on("error", (err) => req.destroy(err)).pipe(req);
  });
}

export type SendInput = {
  fittingId: string; buildId: string; view: string; file: string; fileName?: string;
  captureFps?: number; consentConfirmed: boolean; sha256?: string;
};

/**
 * Registers, sends and completes one file. A file the fitting already has comes back as that
 * clip (`duplicate`); if its upload never arrived, it is sent now into the same clip.
 */
export async function sendFile(api: Api, input: SendInput, log?: (line: string) => void): Promise<SendResult> {
  const { size } = await stat(input.file);
  const sha256 = input.sha256 ?? (await sha256OfFile(input.file));
  // An expired URL (403, mapped to 409) or a lost PUT repeats the registration, which hands out a fresh URL.
  return withRetry(path.basename(input.file), async () => {
    const { clip, duplicate, upload } = await api<{ clip: Clip; duplicate: boolean; upload: Upload | null }>("POST", "/api/clips", {
      fittingId: input.fittingId, buildId: input.buildId, view: input.view, fileName: input.fileName ?? path.basename(input.file),
      contentType: contentTypeOf(input.file), sizeBytes: size, captureFps: input.captureFps,
      consentConfirmed: input.consentConfirmed, contentSha256: sha256,
    });
    if (!upload) return { clip, duplicate, sent: false };
    await putFile(upload, input.file, size);
    await api("POST", `/api/clips/${clip.id}/complete`);
    return { clip, duplicate, sent: true };
  }, 10, log);
}
