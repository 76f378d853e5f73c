// The capture computer's side of the clip API: register a file (with its SHA-256, so that the
// server answers a file it already has with that clip), send it to the store by the presigned
// URL — a large file in parts, of which only the missing ones go again —, and complete it. Every step is retried with back-off on a dropped connection; since the
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

/**
 * Streams bytes [start, end) of the file to a presigned URL with an exact Content-Length (the
 * store refuses chunked bodies) and answers the store's ETag. A refusal is the store's word on
 * that URL (expired, unknown upload): retryable, since the next attempt asks for fresh URLs.
 */
function putRange(url: string, headers: Record<string, string>, file: string, start: number, end: number): Promise<string> {
  const target = new URL(url);
  const client = target.protocol === "https:" ? https : http;
  return new Promise((resolve, reject) => {
    const req = client.request(target, { method: "PUT", headers: { ...headers, "content-length": String(end - start) } }, (res) => {
      res.resume();
      res.on("end", () => {
        const status = res.statusCode ?? 0;
        if (status >= 200 && status < 300) resolve(String(res.headers.etag ?? ""));
        else reject(new UploadError(`the store refused ${path.basename(file)}: ${status}`, 409));
      });
    });
    req.on("error", (err) => reject(new UploadError(`sending ${path.basename(file)}: ${err.message}`)));
    if (end === start) return void req.end();
    createReadStream(file, { start, end: end - 1 }).on("error", (err) => req.destroy(err)).pipe(req);
  });
}

/** A multipart upload under way: its id and the ETag of every part the store has taken. */
export type PartsProgress = { uploadId: string; etags: Record<string, string> };
/** Where a sender keeps parts progress per clip, so that a restart sends only the missing parts. */
export type PartsStore = { load(clipId: string): PartsProgress | undefined; save(clipId: string, progress: PartsProgress | undefined): Promise<void> };

export function memoryPartsStore(): PartsStore {
  const byClip = new Map<string, PartsProgress>();
  return {
    load: (clipId) => byClip.get(clipId),
    save: async (clipId, progress) => void (progress ? byClip.set(clipId, progress) : byClip.delete(clipId)),
  };
}

const PART_URLS_PER_CALL = 10; // presigned URLs live 15 min: ask for a few at a time

async function sendParts(api: Api, clipId: string, input: SendInput, size: number) {
  const { file, partBytes, parts: store } = input;
  const count = Math.ceil(size / partBytes);
  const progress: PartsProgress = store.load(clipId) ?? { uploadId: "", etags: {} };
  const missing = Array.from({ length: count }, (_, i) => i + 1).filter((n) => !progress.etags[n]);
  for (let i = 0; i < missing.length; i += PART_URLS_PER_CALL) {
    const { uploadId, parts } = await api<{ uploadId: string; parts: { partNumber: number; url: string }[] }>(
      "POST", `/api/clips/${clipId}/parts`, { uploadId: progress.uploadId || undefined, partNumbers: missing.slice(i, i + PART_URLS_PER_CALL) },
    );
    progress.uploadId = uploadId;
    for (const part of parts) {
      const start = (part.partNumber - 1) * partBytes;
      try {
        progress.etags[part.partNumber] = await putRange(part.url, {}, file, start, Math.min(size, start + partBytes));
      } catch (err) {
        // A store that no longer knows the upload (it expired or was cleaned up) means starting it over.
        if (err instanceof UploadError && err.status === 409 && /: 404$/.test(err.message)) await store.save(clipId, undefined);
        throw err;
      }
      await store.save(clipId, progress);
      input.onPart?.(part.partNumber, count);
    }
  }
  const parts = Object.entries(progress.etags).map(([n, etag]) => ({ partNumber: Number(n), etag }));
  await api("POST", `/api/clips/${clipId}/complete`, { uploadId: progress.uploadId, parts }).catch(async (err: unknown) => {
    if (err instanceof UploadError && err.status === 409) await store.save(clipId, undefined);
    throw err;
  });
  await store.save(clipId, undefined);
}

export type SendInput = {
  fittingId: string; buildId: string; view: string; file: string; fileName?: string;
  captureFps?: number; consentConfirmed: boolean; sha256?: string;
  /** A file larger than this goes up in parts of this size (the store wants at least 5 MiB but the last). */
  partBytes: number; parts: PartsStore;
  onPart?: (partNumber: number, count: number) => void;
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
    if (size > input.partBytes) {
      await sendParts(api, clip.id, input, size);
    } else {
      await putRange(upload.url, upload.headers, input.file, 0, size);
      await api("POST", `/api/clips/${clip.id}/complete`);
    }
    return { clip, duplicate, sent: true };
  }, 10, log);
}
