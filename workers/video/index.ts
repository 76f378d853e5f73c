// The clip pipeline's public face for the job runner.
export { processClipFile, type ClipProcessingOptions, type ProcessedClip } from "./pipeline";
export { ClipRefusedError, CLIP_LIMITS, type RefusalCode } from "./refusals";
export { proxyTiming, stripLayout } from "./layout";
export { probe, probeHeader, warmUp, VideoJobAbortedError, UnreadableVideoError, FfmpegFailedError, type VideoProbe, type VideoHeader } from "./ffmpeg";
