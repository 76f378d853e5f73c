// The clip pipeline's public face for the job runner.
export { processClipFile, proxyTiming, ClipRefusedError, CLIP_LIMITS, type ClipProcessingOptions, type ProcessedClip, type RefusalCode } from "./pipeline";
export { probe, probeHeader, warmUp, VideoJobAbortedError, UnreadableVideoError, FfmpegFailedError, type VideoProbe, type VideoHeader } from "./ffmpeg";
