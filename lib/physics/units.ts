// Exact unit definitions (international yard and pound agreement, 1959).
export const METRES_PER_INCH = 0.0254;
export const METRES_PER_FOOT = 0.3048;
export const GRAMS_PER_OUNCE = 28.349523125;
/** Standard gravity (CGPM 1901); tests that quote g = 9.81 pass it explicitly. */
export const STANDARD_GRAVITY = 9.80665;
