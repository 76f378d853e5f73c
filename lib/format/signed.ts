// The one way a signed number is written: a true minus (U+2212), an explicit plus where the sign
// carries meaning, and never "−0.0" or "+0.0" — a value that rounds to zero is written "0.0".
export const MINUS = "\u2212";

/** `value` to `decimals` places with its sign; `plus: false` leaves positives bare. */
export function signed(value: number, decimals: number, { plus = true }: { plus?: boolean } = {}): string {
  if (!Number.isFinite(value)) return "—";
  const text = Math.abs(value).toFixed(decimals);
  if (Number(text) === 0) return text;
  return `${value < 0 ? MINUS : plus ? "+" : ""}${text}`;
}

/** A plain (unsigned-quantity) number that may still be negative: no plus, true minus. */
export const plain = (value: number, decimals: number) => signed(value, decimals, { plus: false });

/** Milliseconds relative to a reference frame: "−12.5 ms", "+4.2 ms", "0.0 ms". */
export const signedMs = (ms: number) => `${signed(ms, 1)} ms`;

/** A signed value with the side in words beside it: "−0.6° closed"; no words on a value shown as zero. */
export function signedWithWords(value: number, decimals: number, unit: string, words: { positive: string; negative: string } | null): string {
  const text = signed(value, decimals, { plus: words !== null });
  const side = words && Number(text.replace(MINUS, "-")) !== 0 ? ` ${value > 0 ? words.positive : words.negative}` : "";
  return `${text}${unit}${side}`;
}
