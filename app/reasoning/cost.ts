// checkCost: one money figure per check, so checks of different kinds can be compared.
import { fail } from "./errors";

export type CheckCostInput = {
  minutes: number; // hands-on time
  labourRatePerHour: number; // the workshop's rate
  consumables?: number; // money: cleaner, a gasket, a dye cartridge
  access?: Record<string, number>; // extra minutes to get at it, by kind: { ramp: 10, wheels_off: 15 }
};

/**
 * cost = (minutes + Σ access minutes) × rate / 60 + consumables.
 * Access is charged to every check that needs it; the plan does not yet credit a ramp already up
 * for the previous check (a known simplification).
 */
export function checkCost(input: CheckCostInput): number {
  const nonNegative = (v: unknown, what: string): number => {
    if (typeof v !== "number" || !Number.isFinite(v) || v < 0)
      fail("INVALID_COST", `${what} is ${String(v)}; it must be 0 or more.`);
    return v;
  };
  let minutes = nonNegative(input.minutes, "Check minutes");
  for (const [kind, m] of Object.entries(input.access ?? {}))
    minutes += nonNegative(m, `Access minutes for ${kind}`);
  const rate = nonNegative(input.labourRatePerHour, "The labour rate");
  return (minutes * rate) / 60 + nonNegative(input.consumables ?? 0, "Consumables");
}
