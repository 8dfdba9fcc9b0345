// How conditions weigh in the ranking; the list of conditions itself is the domain's (app/domain).
export { CONDITIONS, SPEED_BANDS_KMH, speedBand, type Condition } from "~/domain/conditions";
import { CONDITIONS } from "~/domain/conditions";

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
    if (i < 0)
      throw new RangeError(`${what()} names the condition "${c}"; use one of ${CONDITIONS.join(", ")}.`);
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
