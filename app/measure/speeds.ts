// Road speeds written in knowledge-base text ("brake gently from about 80 km/h") put in the
// workshop's own units: a workshop in miles reads "about 50 mph". Rounded to the nearest 5 mph, as
// a speedometer is read on a road test. 1 mile = 1.609344 km exactly (international mile, 1959).
import type { UnitSystem } from "./format";

const KM_PER_MILE = 1.609344;
const toMph = (kmh: number) => Math.max(5, Math.round(kmh / KM_PER_MILE / 5) * 5);

/** The text with every "N km/h" or "N–M km/h" in mph for a workshop that counts miles. */
export function speedsIn(text: string, units: UnitSystem): string {
  if (units === "metric") return text;
  return text.replace(/(\d+)(?:\s*([–-])\s*(\d+))?\s*km\/h/g, (_all, a: string, dash?: string, b?: string) =>
    b ? `${toMph(Number(a))}${dash}${toMph(Number(b))} mph` : `${toMph(Number(a))} mph`,
  );
}
