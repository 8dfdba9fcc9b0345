// The circumstances a symptom is seen under, as one list: an observation may carry some ("judder
// only when braking from speed" → braking, high_speed) and a symptom link may say under which a
// cause shows its symptom. The reasoning core weighs them (app/reasoning/conditions.ts).
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
  return kmh < SPEED_BANDS_KMH.low_speed[1]
    ? "low_speed"
    : kmh < SPEED_BANDS_KMH.mid_speed[1]
      ? "mid_speed"
      : "high_speed";
}

export const CONDITION_LABEL: Record<Condition, string> = {
  cold: "engine cold",
  warm: "engine warm",
  braking: "braking",
  accelerating: "accelerating",
  over_bumps: "over bumps",
  turning: "turning",
  at_idle: "at idle",
  low_speed: "low speed",
  mid_speed: "middle speed",
  high_speed: "high speed",
};
