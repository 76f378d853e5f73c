// The capture computer's watcher (`npm run upload -- --watch DIR`) as a child process of a test,
// with its output lines collected, against the running stack.
import { spawn, type ChildProcess } from "node:child_process";
import { setTimeout as sleep } from "node:timers/promises";
import { BASE } from "./http";

export type Watcher = { child: ChildProcess; lines: string[] };
const running: Watcher[] = [];
export const stopWatchers = () => running.splice(0).forEach((w) => w.child.kill("SIGKILL"));

export async function startWatcher(dir: string, fittingId: string, token: string, extra: string[] = [], baseUrl = BASE): Promise<Watcher> {
  // One node process (tsx as a loader), so that a kill reaches the watcher itself.
  const child = spawn(process.execPath, ["--import", "tsx", "scripts/upload.ts", "--watch", dir, "--fitting", fittingId, "--consent", "--settle-ms", "800", ...extra], {
    env: { ...process.env, FITFRAME_TOKEN: token, FITFRAME_URL: baseUrl },
    stdio: ["ignore", "pipe", "pipe"],
  });
  const watcher = { child, lines: [] as string[] };
  running.push(watcher);
  let buffered = "";
  child.stdout!.on("data", (chunk: Buffer) => {
    buffered += chunk.toString();
    const parts = buffered.split("\n");
    buffered = parts.pop()!;
    watcher.lines.push(...parts);
  });
  child.stderr!.on("data", (chunk: Buffer) => process.stderr.write(chunk));
  await lineMatching(watcher, (l) => l.startsWith("watching "));
  return watcher;
}

export async function lineMatching(w: Watcher, test: (line: string) => boolean, timeoutMs = 20_000): Promise<string> {
  const until = Date.now() + timeoutMs;
  for (;;) {
    const line = w.lines.find(test);
    if (line) return line;
    if (Date.now() > until) throw new Error(`no matching line; the watcher printed:\n${w.lines.join("\n")}`);
    await sleep(100);
  }
}
export const sentLine = (w: Watcher, relative: string) => lineMatching(w, (l) => l.startsWith(`${relative}\t`) && /\t(sent|already there)/.test(l));

