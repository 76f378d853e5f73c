// The watch folder on the capture computer: every new video file under DIR goes, once it has
// stopped growing, into the build that was recording on the fitting when the file appeared.
//
// Layout: DIR/overhead/…, DIR/face-on/…, DIR/down-the-line/… (the camera's sub-folder names the
// view), or a file name carrying the view between separators, e.g. `0412_face-on_003.mp4`.
// DIR/.fitframe-sent.json remembers, per file, the build it appeared under and the clip it
// became; the server's duplicate answer (same SHA-256 in the fitting) is the final word, so a
// lost or deleted state file never leads to a second upload.
import { readFile, rename, stat, writeFile } from "node:fs/promises";
import path from "node:path";
import { setTimeout as sleep } from "node:timers/promises";
import { watch } from "chokidar";
import { VIEWS } from "@/lib/marks/types";
import { CONTENT_TYPES, sendFile, sha256OfFile, UploadError, withRetry, type Api, type PartsProgress, type PartsStore } from "./upload-client";

export const STATE_FILE = ".fitframe-sent.json";

type View = (typeof VIEWS)[number];
type FileState = {
  fittingId: string; buildId: string; sha256?: string; size?: number; mtimeMs?: number; clipId?: string; sentAt?: string;
  /** A file going up in parts: the parts the store has, so that a restart sends only the rest. */
  parts?: PartsProgress & { clipId: string };
};
type State = Record<string, FileState>;

export type WatchOptions = {
  api: Api; dir: string; fittingId: string; captureFps?: number; consentConfirmed: boolean;
  /** How long a file's size must stay the same before it counts as written. */
  settleMs: number;
  /** Files larger than this go up in parts of this size. */
  partBytes: number;
  log: (line: string) => void;
};

const VIEW_IN_NAME = new RegExp(`(?:^|[_.\\s])(${VIEWS.join("|")})(?=[_.\\s])`, "i");

/** The view of a file: its first sub-folder under DIR if that is a view's name, else a view named in the file name. */
export function viewOf(relativePath: string): View | null {
  const [first, ...rest] = relativePath.split(path.sep);
  if (rest.length > 0 && (VIEWS as readonly string[]).includes(first!.toLowerCase())) return first!.toLowerCase() as View;
  const match = VIEW_IN_NAME.exec(path.basename(relativePath));
  return match ? (match[1]!.toLowerCase() as View) : null;
}

const isVideo = (file: string) => path.extname(file).toLowerCase() in CONTENT_TYPES;

export async function watchFolder(options: WatchOptions) {
  const { api, dir, fittingId, log } = options;
  const statePath = path.join(dir, STATE_FILE);
  const state: State = JSON.parse(await readFile(statePath, "utf8").catch(() => "{}"));
  let saving = Promise.resolve();
  const saveState = () => {
    // Written whole to a temporary file and renamed, so a kill mid-write leaves the old state.
    const write = saving.then(async () => {
      await writeFile(`${statePath}.tmp`, JSON.stringify(state, null, 1));
      await rename(`${statePath}.tmp`, statePath);
    });
    saving = write.catch(() => undefined); // one failed write must not stop the later ones
    return write;
  };

  /** The recording build now; while none is set, asks again every 2 s. */
  async function recordingBuild(file: string): Promise<string> {
    for (let warned = false; ; warned = true) {
      const fitting = await withRetry("GET fitting", () => api<{ recordingBuildId: string | null }>("GET", `/api/fittings/${fittingId}`), 8, log);
      if (fitting.recordingBuildId) return fitting.recordingBuildId;
      if (!warned) log(`${file}\twaiting: no build is recording on this fitting; choose one on the fitting page`);
      await sleep(2000);
    }
  }

  /** Resolves once the file's size and modification time have not changed for `settleMs`. */
  async function stoppedGrowing(absolute: string) {
    let last = "";
    let sameSince = Date.now();
    for (;;) {
      const { size, mtimeMs } = await stat(absolute);
      const now = `${size}:${mtimeMs}`;
      if (now !== last) {
        last = now;
        sameSince = Date.now();
      } else if (size > 0 && Date.now() - sameSince >= options.settleMs) {
        return;
      }
      await sleep(Math.min(250, options.settleMs / 2));
    }
  }

  // One file at a time to the server, in the order they finished writing.
  let sending = Promise.resolve();
  const pending = new Set<string>();

  async function handle(absolute: string) {
    const relative = path.relative(dir, absolute);
    if (pending.has(relative)) return;
    const view = viewOf(relative);
    if (!view) {
      log(`${relative}\tskipped: no view (put it under overhead/, face-on/ or down-the-line/, or name it …_face-on_…)`);
      return;
    }
    pending.add(relative);
    try {
      const known = state[relative];
      const { size, mtimeMs } = await stat(absolute);
      const sameFile = known?.clipId !== undefined && known.size === size && known.mtimeMs === mtimeMs;
      // A folder kept from an earlier fitting: its files are that golfer's, never caught up into this one.
      if (known && known.fittingId !== fittingId && (sameFile || !known.clipId)) {
        if (!sameFile) log(`${relative}\tleft alone: it appeared during fitting ${known.fittingId}`);
        return;
      }
      if (sameFile) return;
      // The build is fixed when the file appears, before it has finished writing; a file that
      // appeared while the watcher was down, or a new file under a name used before, goes to the
      // build recording now.
      if (!known || known.clipId) {
        state[relative] = { fittingId, buildId: await recordingBuild(relative) };
        await saveState();
      }
      await stoppedGrowing(absolute);
      const job = sending.then(() => send(absolute, relative, view));
      sending = job.catch(() => undefined); // a file that fails must not hold up the next
      await job;
    } catch (err) {
      if (err instanceof UploadError && err.retryable) {
        // The server or the network is still away after the back-off: keep trying while running.
        log(`${relative}\tnot sent yet: ${err.message}; trying again in 30 s`);
        setTimeout(() => void handle(absolute), 30_000).unref();
      } else {
        log(`${relative}\tnot sent: ${(err as Error).message} (it is tried again when the watcher restarts)`);
      }
    } finally {
      pending.delete(relative);
    }
  }

  async function send(absolute: string, relative: string, view: View) {
    const entry = state[relative]!;
    const { size, mtimeMs } = await stat(absolute);
    const sha256 = await sha256OfFile(absolute);
    const parts: PartsStore = {
      load: (clipId) => (entry.parts?.clipId === clipId ? entry.parts : undefined),
      save: async (clipId, progress) => {
        entry.parts = progress ? { ...progress, clipId } : undefined;
        await saveState();
      },
    };
    const { clip, duplicate, sent } = await sendFile(api, {
      fittingId, buildId: entry.buildId, view, file: absolute, fileName: path.basename(relative),
      captureFps: options.captureFps, consentConfirmed: options.consentConfirmed, sha256, partBytes: options.partBytes, parts,
      onPart: (n, count) => log(`${relative}\tpart ${n}/${count}`),
    }, log);
    Object.assign(entry, { sha256, size, mtimeMs, clipId: clip.id, sentAt: new Date().toISOString() });
    await saveState();
    const outcome = !sent ? `already there (${clip.originalName})` : duplicate ? "sent (finished an upload that had broken off)" : "sent";
    log(`${relative}\t${clip.id}\t${clip.buildId}\t${clip.view}\t${outcome}`);
  }

  const watcher = watch(dir, {
    // Existing files are reported too: on start the watcher catches up on what it has not sent.
    ignoreInitial: false,
    ignored: (file, stats) => path.basename(file).startsWith(".") || (stats?.isFile() === true && !isVideo(file)),
    depth: 3,
  });
  watcher.on("add", (file) => void handle(file));
  watcher.on("error", (err) => log(`watch error: ${(err as Error).message}`));
  await new Promise<void>((resolve) => watcher.once("ready", () => resolve()));
  log(`watching ${dir} for fitting ${fittingId}`);
  return { close: () => watcher.close() };
}
