// The conditions a typed complaint names, from the synonym table's condition concepts: "judder
// only when braking from the motorway" → braking, high_speed. The palette records them with the
// observation, so the ranking can use them.
import type { Condition } from "../reasoning/conditions";
import type { Token } from "./analyse";

const CONCEPT_CONDITION: Record<string, Condition> = {
  _brake: "braking",
  _bump: "over_bumps",
  _cornering: "turning",
  _idle: "at_idle",
  _cold_start: "cold",
  _warm: "warm",
  _accelerating: "accelerating",
  _pulling_away: "accelerating",
  _at_speed: "high_speed",
  _low_speed: "low_speed",
};

export function conditionsOf(tokens: readonly Token[]): Condition[] {
  const out: Condition[] = [];
  for (const t of tokens) {
    const c = t.concept ? CONCEPT_CONDITION[t.concept] : undefined;
    if (c && !out.includes(c)) out.push(c);
  }
  return out;
}
