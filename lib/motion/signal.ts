/**
 * Motion signal: one number per frame, the mean absolute difference between a frame and
 * the one before it, on small greyscale frames (the worker uses 128 px on the long side:
 * big enough to keep a ball several pixels across, small enough to cost nothing next to
 * decoding).
 * signal[0] = 0 because the first frame has no predecessor.
 */

export function meanAbsoluteDifference(previous: Uint8Array, current: Uint8Array): number {
  if (previous.length !== current.length) throw new Error("frames must have the same size");
  if (current.length === 0) return 0;
  let sum = 0;
  for (let i = 0; i < current.length; i++) sum += Math.abs(current[i]! - previous[i]!);
  return sum / current.length;
}

/** Builds the signal one frame at a time, so frames can be dropped as they stream past. */
export class MotionSignalBuilder {
  private previous: Uint8Array | null = null;
  private readonly values: number[] = [];

  push(frame: Uint8Array): void {
    this.values.push(this.previous ? meanAbsoluteDifference(this.previous, frame) : 0);
    // Keep a copy: streamed chunks may be reused by their producer.
    this.previous = Uint8Array.from(frame);
  }

  get length(): number {
    return this.values.length;
  }

  signal(): number[] {
    return [...this.values];
  }
}

export function motionSignal(frames: readonly Uint8Array[]): number[] {
  const builder = new MotionSignalBuilder();
  for (const frame of frames) builder.push(frame);
  return builder.signal();
}
