/**
 * The one module that runs Debian's ffmpeg and ffprobe. ffmpeg commands go through
 * fluent-ffmpeg; ffprobe is spawned directly because fluent-ffmpeg's probe cannot be
 * killed. Every process is killed (SIGKILL) when the caller's AbortSignal fires.
 */
import { execFile } from "node:child_process";
import { open, stat } from "node:fs/promises";
import { setPriority } from "node:os";
import { Writable } from "node:stream";
import ffmpeg from "fluent-ffmpeg";

/** A file we cannot read as a video; `reason` is written for a fitter. */
export class UnreadableVideoError extends Error {
  constructor(
    readonly code: "empty-file" | "not-a-video" | "truncated",
    readonly reason: string,
    detail?: string,
  ) {
    super(detail ? `${reason} (${detail})` : reason);
    this.name = "UnreadableVideoError";
  }
}

export class VideoJobAbortedError extends Error {
  constructor() {
    super("the video job was abandoned");
    this.name = "VideoJobAbortedError";
  }
}

export class FfmpegFailedError extends Error {
  constructor(readonly stderr: string, message: string) {
    super(message);
    this.name = "FfmpegFailedError";
  }
}

export interface VideoHeader {
  hasVideo: boolean;
  /** true when the only "video" is a single picture (PNG, JPEG …) */
  isStillImage: boolean;
  hasAudio: boolean;
  codec: string | null;
  /** stored size, before rotation */
  width: number;
  height: number;
  /** clockwise degrees the player turns the picture: 0, 90, 180 or 270 */
  rotation: number;
  /** the frame rate written in the file (often not the capture rate) */
  containerFps: number;
  durationS: number;
  /** the container's frame count; can be wrong, null when absent */
  headerFrameCount: number | null;
}

export interface VideoProbe extends VideoHeader {
  /** frames actually decoded, as `ffprobe -count_frames` nb_read_frames */
  frameCount: number;
}

const STILL_IMAGE_CODECS = new Set(["png", "mjpeg", "bmp", "webp", "tiff", "jpeg2000", "jpegls", "gif", "ppm", "pgm"]);

function throwIfAborted(signal?: AbortSignal): void {
  if (signal?.aborted) throw new VideoJobAbortedError();
}

function runFfprobe(args: string[], signal?: AbortSignal): Promise<{ stdout: string; stderr: string }> {
  throwIfAborted(signal);
  return new Promise((resolve, reject) => {
    execFile(
      "ffprobe",
      ["-v", "error", ...args],
      { signal, killSignal: "SIGKILL", maxBuffer: 64 * 1024 * 1024 },
      (error, stdout, stderr) => {
        if (signal?.aborted) reject(new VideoJobAbortedError());
        else if (error) reject(new FfmpegFailedError(stderr, `ffprobe failed: ${stderr.trim() || error.message}`));
        else resolve({ stdout, stderr });
      },
    );
  });
}

async function startsLikeIsoMedia(file: string): Promise<boolean> {
  const handle = await open(file, "r");
  try {
    const head = Buffer.alloc(12);
    const { bytesRead } = await handle.read(head, 0, 12, 0);
    return bytesRead >= 8 && ["ftyp", "moov", "mdat", "wide", "free"].includes(head.toString("latin1", 4, 8));
  } finally {
    await handle.close();
  }
}

function parseRate(rate: unknown): number {
  if (typeof rate !== "string") return 0;
  const [num, den] = rate.split("/").map(Number);
  if (!num || !Number.isFinite(num)) return 0;
  return den ? num / den : num;
}

interface ProbeStream {
  codec_type?: string;
  codec_name?: string;
  width?: number;
  height?: number;
  avg_frame_rate?: string;
  r_frame_rate?: string;
  duration?: string;
  nb_frames?: string;
  tags?: { rotate?: string };
  side_data_list?: { rotation?: number }[];
}

/** Stream facts from the container header, without decoding. */
export async function probeHeader(file: string, signal?: AbortSignal): Promise<VideoHeader> {
  const { size } = await stat(file);
  if (size === 0) throw new UnreadableVideoError("empty-file", "The file is empty (0 bytes).");
  let json: string;
  try {
    json = (await runFfprobe(["-print_format", "json", "-show_streams", "-show_format", file], signal)).stdout;
  } catch (error) {
    if (!(error instanceof FfmpegFailedError)) throw error;
    if (await startsLikeIsoMedia(file)) {
      throw new UnreadableVideoError("truncated", "The video file is incomplete: it was cut short, probably during upload.", error.stderr.trim());
    }
    throw new UnreadableVideoError("not-a-video", "This file is not a video.", error.stderr.trim());
  }
  const data = JSON.parse(json) as { streams?: ProbeStream[]; format?: { format_name?: string; duration?: string } };
  const streams = data.streams ?? [];
  const video = streams.find((s) => s.codec_type === "video");
  const hasAudio = streams.some((s) => s.codec_type === "audio");
  const formatName = data.format?.format_name ?? "";
  if (!video) {
    return { hasVideo: false, isStillImage: false, hasAudio, codec: null, width: 0, height: 0, rotation: 0, containerFps: 0, durationS: Number(data.format?.duration ?? 0) || 0, headerFrameCount: null };
  }
  // The display matrix's rotation is counter-clockwise; the old `rotate` tag is clockwise.
  const matrixRotation = video.side_data_list?.find((d) => typeof d.rotation === "number")?.rotation;
  const clockwise = matrixRotation !== undefined ? -matrixRotation : Number(video.tags?.rotate ?? 0) || 0;
  const rotation = ((Math.round(clockwise) % 360) + 360) % 360;
  const headerFrames = Number(video.nb_frames);
  return {
    hasVideo: true,
    isStillImage: formatName.endsWith("_pipe") || formatName === "image2" || (STILL_IMAGE_CODECS.has(video.codec_name ?? "") && !(headerFrames > 1)),
    hasAudio,
    codec: video.codec_name ?? null,
    width: video.width ?? 0,
    height: video.height ?? 0,
    rotation,
    containerFps: parseRate(video.avg_frame_rate) || parseRate(video.r_frame_rate),
    durationS: Number(video.duration ?? data.format?.duration ?? 0) || 0,
    headerFrameCount: Number.isInteger(headerFrames) && headerFrames > 0 ? headerFrames : null,
  };
}

/** Decodes every frame to count it (`ffprobe -count_frames`); slow on long clips. */
export async function countFrames(file: string, signal?: AbortSignal): Promise<number> {
  const { stdout } = await runFfprobe(
    ["-count_frames", "-select_streams", "v:0", "-show_entries", "stream=nb_read_frames", "-print_format", "json", file],
    signal,
  );
  const data = JSON.parse(stdout) as { streams?: { nb_read_frames?: string }[] };
  return Number(data.streams?.[0]?.nb_read_frames ?? 0) || 0;
}

export async function probe(file: string, signal?: AbortSignal): Promise<VideoProbe> {
  const header = await probeHeader(file, signal);
  return { ...header, frameCount: header.hasVideo ? await countFrames(file, signal) : 0 };
}

/** The display size after the player's rotation. */
export function displaySize(header: Pick<VideoHeader, "width" | "height" | "rotation">): { width: number; height: number } {
  const turned = header.rotation === 90 || header.rotation === 270;
  return turned ? { width: header.height, height: header.width } : { width: header.width, height: header.height };
}

/** Size with the long side capped, aspect kept, both sides even (H.264 wants even). */
export function capLongSide(width: number, height: number, maxLongSide: number, even = false): { width: number; height: number } {
  const scale = Math.min(1, maxLongSide / Math.max(width, height));
  const round = (v: number) => (even ? Math.max(2, Math.round(v / 2) * 2) : Math.max(1, Math.round(v)));
  return scale === 1 && !even ? { width, height } : { width: round(width * scale), height: round(height * scale) };
}

interface RunOptions {
  signal: AbortSignal;
  /** lower CPU priority (nice), so a concurrent urgent command gets the cores first */
  niceness?: number;
  onStderrLine?: (line: string) => void;
  onStart?: (pid: number) => void;
}

/** Runs a prepared fluent-ffmpeg command; kills it on abort. */
function runCommand(command: ffmpeg.FfmpegCommand, options: RunOptions): Promise<string> {
  throwIfAborted(options.signal);
  return new Promise((resolve, reject) => {
    const stderrTail: string[] = [];
    const kill = () => command.kill("SIGKILL");
    options.signal.addEventListener("abort", kill, { once: true });
    if (options.niceness) command.renice(options.niceness);
    command
      .on("start", () => {
        const pid = (command as unknown as { ffmpegProc?: { pid?: number } }).ffmpegProc?.pid;
        if (pid && options.onStart) options.onStart(pid);
        // The abort may have landed between spawn request and spawn.
        if (options.signal.aborted) kill();
      })
      .on("stderr", (line: string) => {
        stderrTail.push(line);
        if (stderrTail.length > 200) stderrTail.shift();
        options.onStderrLine?.(line);
      })
      .on("error", (error: Error) => {
        options.signal.removeEventListener("abort", kill);
        if (options.signal.aborted) reject(new VideoJobAbortedError());
        else reject(new FfmpegFailedError(stderrTail.join("\n"), `ffmpeg failed: ${error.message}`));
      })
      .on("end", () => {
        options.signal.removeEventListener("abort", kill);
        resolve(stderrTail.join("\n"));
      })
      .run();
  });
}

const QUIET = ["-hide_banner", "-nostdin"];
/**
 * Standard Huffman tables instead of per-frame optimal ones: the same pixels, files about
 * 10 % larger, about 15 % less CPU for the frame export (measured with bench-worker).
 */
const JPEG_ENTROPY = ["-huffman", "default"];
/** measured with scripts/bench-worker.ts: the proxy encode is the full pass's main extra cost */
const PROXY_X264_PRESET = "ultrafast";

export interface GreyFrames {
  frameCount: number;
  width: number;
  height: number;
  /** presentation time of each frame, seconds from the start of the clip */
  frameTimesS: number[];
  /** the decoder reported damaged or missing data */
  damaged: boolean;
}

/**
 * Every frame, grey, streamed to `onFrame` in order. The frame buffer is reused for the next
 * frame: copy what you keep. By default the in-loop deblocking filter is skipped: it costs time
 * and changes nothing the motion signal needs; the tracker's full-size decode keeps it
 * (`deblock: true`), as block edges would shift its sub-pixel fits.
 */
export function readGreyFrames(
  file: string,
  options: {
    width: number;
    height: number;
    signal: AbortSignal;
    onFrame: (frame: Uint8Array, index: number) => void;
    onStart?: (pid: number) => void;
    deblock?: boolean;
    niceness?: number;
  },
): Promise<GreyFrames> {
  const frameBytes = options.width * options.height;
  const frameTimesS: number[] = [];
  let damaged = false;
  // One frame's buffer, filled chunk by chunk (pipe chunks are far smaller than a full-size frame).
  const frame = Buffer.allocUnsafe(frameBytes);
  let filled = 0;
  let index = 0;
  const sink = new Writable({
    write(chunk: Buffer, _encoding, done) {
      let offset = 0;
      while (offset < chunk.length) {
        const n = Math.min(frameBytes - filled, chunk.length - offset);
        chunk.copy(frame, filled, offset, offset + n);
        filled += n;
        offset += n;
        if (filled === frameBytes) {
          options.onFrame(frame, index++);
          filled = 0;
        }
      }
      done();
    },
  });
  const command = ffmpeg(file)
    .inputOptions(options.deblock ? [] : ["-skip_loop_filter", "all"])
    .outputOptions([
      ...QUIET,
      "-map", "0:v:0",
      // The tracker's full-size read takes the luma plane as decoded (no pixel-format conversion,
      // no per-frame checksums): the cheapest grey there is.
      "-vf", options.deblock
        ? `scale=${options.width}:${options.height}:flags=area,format=yuv420p,extractplanes=y,showinfo=checksum=0`
        : `scale=${options.width}:${options.height}:flags=area,format=gray,showinfo`,
      "-fps_mode", "passthrough",
      "-f", "rawvideo",
    ])
    .output(sink);
  return runCommand(command, {
    signal: options.signal,
    niceness: options.niceness,
    onStart: options.onStart,
    onStderrLine: (line) => {
      const shown = /\bn:\s*(\d+)\s+pts:\s*-?\d+\s+pts_time:\s*(-?[\d.e+-]+)/.exec(line);
      if (shown) frameTimesS[Number(shown[1])] = Number(shown[2]);
      else if (/partial file|Invalid data|error while decoding|corrupt|missing picture/i.test(line)) damaged = true;
    },
  }).then(
    () => ({ frameCount: index, width: options.width, height: options.height, frameTimesS, damaged }),
    (error: unknown) => {
      // A damaged file makes ffmpeg exit with an error after the frames it could read;
      // the caller decides what a short read means.
      if (error instanceof FfmpegFailedError && damaged) return { frameCount: index, width: options.width, height: options.height, frameTimesS, damaged };
      throw error;
    },
  );
}

export interface FrameWindowRequest {
  firstFrame: number;
  count: number;
  /** presentation time of `firstFrame` (from readGreyFrames) */
  firstFrameTimeS: number;
  /** half a frame interval: seek lands between two frames, never on a boundary */
  halfFrameS: number;
  /** writes `<dir>/<index>.jpg` with 6-digit, 0-based frame indexes */
  dir: string;
  size: { width: number; height: number } | null;
  jpegQuality: number;
  poster?: { offset: number; file: string; size: { width: number; height: number } };
}

/** Seeks and writes a run of frames as JPEG, numbered by their index in the clip. */
export function extractFrameWindow(file: string, request: FrameWindowRequest, options: RunOptions): Promise<string> {
  const seekS = Math.max(0, request.firstFrameTimeS - request.halfFrameS);
  const frames = request.size ? `scale=${request.size.width}:${request.size.height}:flags=bicubic` : "null";
  const graph = request.poster
    ? `[0:v]${frames},split=2[w][p];[p]select='eq(n\\,${request.poster.offset})',scale=${request.poster.size.width}:${request.poster.size.height}:flags=bicubic[poster]`
    : `[0:v]${frames}[w]`;
  const command = ffmpeg(file)
    .inputOptions(["-ss", seekS.toFixed(6)])
    .complexFilter(graph)
    .output(`${request.dir}/%06d.jpg`)
    .outputOptions([...QUIET, "-map", "[w]", "-fps_mode", "passthrough", "-frames:v", String(request.count), "-q:v", String(request.jpegQuality), ...JPEG_ENTROPY, "-start_number", String(request.firstFrame)]);
  if (request.poster) {
    command.output(request.poster.file).outputOptions(["-map", "[poster]", "-frames:v", "1", "-update", "1", "-q:v", "3"]);
  }
  return runCommand(command, options);
}

export interface FullPassRequest {
  /** writes `<dir>/<index>.jpg`, 0-based */
  framesDir: string;
  frameSize: { width: number; height: number } | null;
  jpegQuality: number;
  proxy: { file: string; size: { width: number; height: number }; playbackFps: number; keepEvery: number };
  strip: { file: string; every: number; tiles: number; thumbSize: { width: number; height: number } };
  threads?: number;
}

/**
 * One decode, three outputs: every frame as JPEG, the phone proxy, the contact strip.
 * The proxy is retimed so that one captured frame lasts 1 / playbackFps; when
 * keepEvery > 1 the fps filter keeps every keepEvery-th frame of that timeline.
 */
export function renderFullPass(file: string, request: FullPassRequest, options: RunOptions & { onFrameDone?: (frames: number) => void }): Promise<string> {
  const { proxy, strip } = request;
  const frames = request.frameSize ? `scale=${request.frameSize.width}:${request.frameSize.height}:flags=bicubic` : "null";
  const proxyRate = proxy.playbackFps / proxy.keepEvery;
  const graph = [
    "[0:v]split=3[f0][p0][s0]",
    `[f0]${frames}[frames]`,
    `[p0]setpts=N/(${proxy.playbackFps}*TB)${proxy.keepEvery > 1 ? `,fps=${proxyRate}` : ""},scale=${proxy.size.width}:${proxy.size.height}:flags=fast_bilinear,format=yuv420p[proxy]`,
    `[s0]select='not(mod(n\\,${strip.every}))',scale=${strip.thumbSize.width}:${strip.thumbSize.height}:flags=bilinear,tile=${strip.tiles}x1[strip]`,
  ].join(";");
  const threads = request.threads ? ["-threads", String(request.threads)] : [];
  const command = ffmpeg(file)
    .inputOptions(threads)
    .complexFilter(graph)
    .output(`${request.framesDir}/%06d.jpg`)
    .outputOptions([...QUIET, "-stats", "-map", "[frames]", "-fps_mode", "passthrough", "-q:v", String(request.jpegQuality), ...JPEG_ENTROPY, "-start_number", "0"])
    .output(proxy.file)
    .outputOptions([
      "-map", "[proxy]", "-c:v", "libx264", "-preset", PROXY_X264_PRESET, "-crf", "23", "-pix_fmt", "yuv420p",
      "-r", String(proxyRate), "-movflags", "+faststart", "-an",
    ])
    .output(strip.file)
    .outputOptions(["-map", "[strip]", "-frames:v", "1", "-update", "1", "-q:v", "4"]);
  return runCommand(command, {
    ...options,
    onStderrLine: (line) => {
      const m = /frame=\s*(\d+)/.exec(line);
      if (m) options.onFrameDone?.(Number(m[1]));
      options.onStderrLine?.(line);
    },
  });
}

/**
 * Gives a reniced command normal priority again (once it no longer competes with an
 * urgent one). Raising priority needs privilege; without it the command just runs on.
 */
export function restoreNormalPriority(pid: number): boolean {
  try {
    setPriority(pid, 0);
    return true;
  } catch {
    return false;
  }
}

/** Fills fluent-ffmpeg's cache of formats and encoders so the first job does not wait. */
export function warmUp(): Promise<void> {
  return new Promise((resolve, reject) => {
    ffmpeg.getAvailableFormats((error) => {
      if (error) return reject(error);
      ffmpeg.getAvailableEncoders((err) => (err ? reject(err) : resolve()));
    });
  });
}

/** The reference command the benchmark compares against (plain JPEG export). */
export function plainJpegExport(file: string, dir: string, signal: AbortSignal): Promise<string> {
  const command = ffmpeg(file).output(`${dir}/%06d.jpg`).outputOptions([...QUIET, "-q:v", "3"]);
  return runCommand(command, { signal });
}
