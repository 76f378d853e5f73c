// Balls at rest found once, on one frame, with OpenCV's Hough gradient method (HoughCircles,
// docs.opencv.org/4.x/d4/d70/tutorial_hough_circle.html), each candidate then refined and
// checked by the sub-pixel disc fit; the fit decides, Hough only proposes.
import { fitBall, type BallFit } from "@/lib/tracking/ball";
import type { GreyImage } from "@/lib/tracking/image";
import type { OpenCv } from "./opencv";

/** Ball radius range as shares of the picture's short side (a ball from 1 % to 10 % of it). */
const MIN_RADIUS_SHARE = 0.008;
const MAX_RADIUS_SHARE = 0.1;
export const MAX_BALLS = 3;

export function findBallsAtRest(cv: OpenCv, image: GreyImage): BallFit[] {
  const short = Math.min(image.width, image.height);
  const minR = Math.max(3, Math.round(short * MIN_RADIUS_SHARE)), maxR = Math.round(short * MAX_RADIUS_SHARE);
  const src = new cv.Mat(image.height, image.width, cv.CV_8UC1);
  const blurred = new cv.Mat();
  const circles = new cv.Mat();
  try {
    src.data.set(image.data);
    // The documentation's advice: smooth first, so texture does not vote for false circles.
    cv.GaussianBlur(src, blurred, new cv.Size(5, 5), 1.5, 1.5, cv.BORDER_DEFAULT);
    cv.HoughCircles(blurred, circles, cv.HOUGH_GRADIENT, 1, minR * 2, 100, 18, minR, maxR);
    const found: { fit: BallFit; score: number }[] = [];
    for (let i = 0; i < circles.cols; i++) {
      const [x, y, r] = [circles.data32F[i * 3]!, circles.data32F[i * 3 + 1]!, circles.data32F[i * 3 + 2]!];
      const fit = fitBall(image, { x, y, r });
      if (!fit || fit.residualPx > 0.1 * fit.r + 0.5) continue;
      if (found.some((f) => Math.hypot(f.fit.x - fit.x, f.fit.y - fit.y) < fit.r)) continue;
      found.push({ fit, score: Math.abs(fit.inside - fit.background) * fit.rays });
    }
    return found.sort((a, b) => b.score - a.score).slice(0, MAX_BALLS).map((f) => f.fit);
  } finally {
    src.delete();
    blurred.delete();
    circles.delete();
  }
}
