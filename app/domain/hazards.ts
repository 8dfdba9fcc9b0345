// Which cautions a check needs, judged from what it makes the technician do: its name, its steps
// and the access it needs. The editor and the import refuse a check that needs one and lacks it;
// the starter base's data test holds every check to the same rules. The word lists are ours
// (common workshop practice, no published source): each names the work that carries the hazard.
import type { Caution } from "./knowledge";

export const HAZARD_WORDS: readonly (readonly [Caution, RegExp])[] = [
  ["lifting", /\bramp\b|\bjack(ed)?\b|axle stands?|lifting points?/i],
  ["brake_hydraulics", /bleed|brake fluid|brake pipe|brake line/i],
  [
    "fuel",
    /fuel (line|pipe|rail|pump|filter|pressure|system|work|tank)|(unplug|remove|disconnect|open|fit)[^.]{0,40}injector|injector (pipe|seal|return|coil)|back-leak|water trap/i,
  ],
  [
    "hot_parts",
    /\bhot\b|warm engine|fully warm|working temperature|exhaust (manifold|pipe|system|joint|parts)|tailpipe|\bcatalyst\b|\bturbo\b/i,
  ],
  ["airbag", /airbag|clock.spring|yellow plugs?|belt.tensioner/i],
  ["high_voltage", /high.voltage|hybrid|orange cable|gas-discharge/i],
  ["battery_acid", /battery (post|terminal|clamp|lead)s?|battery work/i],
];

// Work on the ramp or with the wheels off means the car is lifted, whatever the steps say.
const LIFTED_ACCESS = ["ramp", "wheels_off"];

export type HazardCheck = { name: string; instructions: string[]; access: string[]; cautions: string[] };

/** What the check makes someone do, as one text for the word rules. */
export const checkWork = (c: Pick<HazardCheck, "name" | "instructions">) =>
  [c.name, ...c.instructions].join(" ");

/** The cautions the check's work calls for, in the order of HAZARD_WORDS. */
export function neededCautions(c: Omit<HazardCheck, "cautions">): Caution[] {
  const work = checkWork(c);
  const needed = HAZARD_WORDS.filter(([, words]) => words.test(work)).map(([caution]) => caution);
  if (c.access.some((a) => LIFTED_ACCESS.includes(a)) && !needed.includes("lifting"))
    needed.unshift("lifting");
  return needed;
}

/** The cautions the check needs and does not carry. */
export const missingCautions = (c: HazardCheck): Caution[] =>
  neededCautions(c).filter((x) => !c.cautions.includes(x));
