/**
 * OpenCV.js (@techstark/opencv-js, WebAssembly), loaded once per process. The module object is a
 * thenable that resolves to itself, so it is never awaited or returned from an async function:
 * we poll until `cv.Mat` exists and hand out a wrapper. Every Mat must be freed with delete().
 */
import { createRequire } from "node:module";

/** The few OpenCV.js calls the tracker uses (the package ships no type declarations). */
export interface Mat {
  data: Uint8Array;
  data32F: Float32Array;
  rows: number;
  cols: number;
  delete(): void;
}
export interface OpenCv {
  Mat: new (rows?: number, cols?: number, type?: number) => Mat;
  Size: new (width: number, height: number) => unknown;
  CV_8UC1: number;
  HOUGH_GRADIENT: number;
  BORDER_DEFAULT: number;
  /** docs.opencv.org/4.x/dd/d1a/group__imgproc__feature.html#ga47849c3be0d0406ad3ca45db65a25d2d */
  HoughCircles(image: Mat, circles: Mat, method: number, dp: number, minDist: number, param1: number, param2: number, minRadius: number, maxRadius: number): void;
  /** docs.opencv.org/4.x/d4/d86/group__imgproc__filter.html#gaabe8c836e97159a9193fb0b11ac52cf1 */
  GaussianBlur(src: Mat, dst: Mat, size: unknown, sigmaX: number, sigmaY: number, borderType: number): void;
}

let loading: Promise<{ cv: OpenCv }> | null = null;
const LOAD_TIMEOUT_MS = 30_000;

/** Resolves to a wrapper (never to the thenable module itself). */
export function loadOpenCv(): Promise<{ cv: OpenCv }> {
  loading ??= new Promise((resolve, reject) => {
    const require = createRequire(import.meta.url);
    const cv = require("@techstark/opencv-js") as Partial<OpenCv>;
    const started = Date.now();
    const poll = () => {
      if (typeof cv.Mat === "function") resolve({ cv: cv as OpenCv });
      else if (Date.now() - started > LOAD_TIMEOUT_MS) reject(new Error("OpenCV.js did not initialise"));
      else setTimeout(poll, 10);
    };
    poll();
  });
  return loading;
}
