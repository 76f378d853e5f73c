// Words and numbers for the comparison's sentences (screens round; stored values keep precision).
export const signedDeg = (x: number) => `${x > 0 ? "+" : x < 0 ? "−" : ""}${Math.abs(x).toFixed(1)}°`;
export const degrees = (x: number) => `${x.toFixed(1)}°`;
export const percent = (p: number) => `${Math.round(p * 100)}%`;
