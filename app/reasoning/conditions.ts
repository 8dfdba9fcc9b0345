// The circumstances a symptom is seen under, as one list: an observation may carry some ("judder
// only when braking from speed" → braking, high_speed) and a symptom link may say under which a
// cause shows its symptom. Browser-safe and dependency-free, so Quick find and the screens can use
// it; it belongs with the shared vocabulary and may move there.
export const CONDITIONS = [
  "cold", // engine cold: a cold start, the first minutes
  "warm", // engine at working temperature
  "braking",
  "accelerating", // under load: pulling away, climbing, overtaking
  "over_bumps",
  "turning", // cornering, parking, full lock
  "at_idle",
  "low_speed", // road speed below about 30 km/h (20 mph)
  "mid_speed", // about 30–80 km/h (20–50 mph)
  "high_speed", // above about 80 km/h (50 mph): motorway and dual carriageway
] as const;
export type Condition = (typeof CONDITIONS)[number];

/** Road-speed bands in km/h, lower bound inclusive: a rule of thumb for town, main road and motorway (common practice, no published source). */
export const SPEED_BANDS_KMH: Record<"low_speed" | "mid_speed" | "high_speed", readonly [number, number]> = {
  low_speed: [0, 30],
  mid_speed: [30, 80],
  high_speed: [80, Infinity],
};

/** The speed band a road speed falls in. */
export function speedBand(kmh: number): "low_speed" | "mid_speed" | "high_speed" {
  if (!(kmh >= 0)) throw new RangeError(`A road speed is 0 km/h or more, not ${kmh}.`);
  return kmh < SPEED_BANDS_KMH.low_speed[1] ? "low_speed" : kmh < SPEED_BANDS_KMH.mid_speed[1] ? "mid_speed" : "high_speed";
}

/**
 * How conditions count (a modelling choice, not measured): when a cause shows its symptom, the
 * chance it shows it under a given condition is CONDITION_MATCH if its link lists that condition,
 * CONDITION_MISS if the link lists others only, and CONDITION_ANY if the link lists none — as for
 * the symptom's leak and for "not in the knowledge base", which say nothing about conditions. An
 * observation "s under c₁…cₙ" then has P = P(s | h) · Π πₖ(h) (present) or 1 − that (absent).
 */
export const CONDITION_MATCH = 0.9;
export const CONDITION_MISS = 0.15;
export const CONDITION_ANY = 0.5;

/** Conditions as bits, for per-link masks. */
export function conditionMask(list: readonly string[] | undefined, what: () => string): number {
  let mask = 0;
  for (const c of list ?? []) {
    const i = (CONDITIONS as readonly string[]).indexOf(c);
    if (i < 0) throw new RangeError(`${what()} names the condition "${c}"; use one of ${CONDITIONS.join(", ")}.`);
    mask |= 1 << i;
  }
  return mask;
}

/** Π πₖ over the observed conditions for a link with this mask (0: the link names none). */
export function conditionFactor(observed: number, link: number): number {
  let f = 1;
  for (let m = observed; m !== 0; m &= m - 1) {
    const bit = m & -m;
    f *= link === 0 ? CONDITION_ANY : link & bit ? CONDITION_MATCH : CONDITION_MISS;
  }
  return f;
}
