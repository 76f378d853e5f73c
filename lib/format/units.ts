// Units a studio reads its numbers in (studio settings `units` for distances, `speedUnit` for
// speeds). Stored and API values stay SI (m/s, m); only what is shown converts.
import { METRES_PER_FOOT } from "@/lib/physics/units";

export const SPEED_UNITS = ["m/s", "ft/s", "mph"] as const;
export type SpeedUnit = (typeof SPEED_UNITS)[number];
export type UnitPrefs = { units: "ft" | "m"; speedUnit?: SpeedUnit };

// International yard and pound agreement (1959): 1 ft = 0.3048 m exactly, 1 mile = 1609.344 m.
const METRES_PER_MILE = 1609.344;

/** The unit a stored unit is shown in, and the factor from stored to shown. */
export function shownUnit(unit: string, prefs: UnitPrefs): { unit: string; factor: number } {
  if (unit === "m/s") {
    const speed = prefs.speedUnit ?? "m/s";
    if (speed === "ft/s") return { unit: "ft/s", factor: 1 / METRES_PER_FOOT };
    if (speed === "mph") return { unit: "mph", factor: 3600 / METRES_PER_MILE };
    return { unit, factor: 1 };
  }
  if (unit === "m" && prefs.units === "ft") return { unit: "ft", factor: 1 / METRES_PER_FOOT };
  return { unit, factor: 1 };
}

/** A stored value and its uncertainty in the studio's units. */
export function inStudioUnits(value: number, uncertainty: number | null | undefined, unit: string, prefs: UnitPrefs) {
  const { unit: shown, factor } = shownUnit(unit, prefs);
  return { value: value * factor, uncertainty: uncertainty == null ? uncertainty : uncertainty * factor, unit: shown };
}
