// Words and numbers for the comparison's sentences (screens round; stored values keep precision).
import { signed } from "@/lib/format/signed";

export const signedDeg = (x: number) => `${signed(x, 1)}°`;
export const degrees = (x: number) => `${x.toFixed(1)}°`;
export const percent = (p: number) => `${Math.round(p * 100)}%`;
