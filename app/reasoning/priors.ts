// resolvePriors: the prior of each candidate fault for one vehicle, for the server to put into a
// Model. Three steps, each visible in the result so a senior can see why a figure is what it is:
//   1. base rate × applicability factor (fuel, drivetrain, age, mileage band);
//   2. normalised over the candidates: p₀;
//   3. blended with the workshop's confirmed outcomes by additive (Dirichlet) smoothing,
//      p̂ = (count + α·p₀) / (n + α), n = Σ counts (Manning, Raghavan & Schütze, Introduction to
//      Information Retrieval, ch. 13). α is a pseudo-count: how many closed cases the curated base
//      rates are worth.
import { fail } from "./errors";

/** α = 20: the curated rates weigh as much as 20 closed cases. A modelling choice, not a measured figure. */
export const DEFAULT_PSEUDO_COUNT = 20;
/** Below a minimum age or mileage a cause is this much rarer, per threshold not reached. A modelling choice. */
export const DEFAULT_YOUNG_FACTOR = 0.3;

export type Applicability = {
  fuel?: readonly string[]; // absent: any fuel; otherwise other fuels get factor 0
  drivetrain?: readonly string[]; // absent: any drivetrain
  minAgeYears?: number; // a younger vehicle gets × youngFactor
  minKm?: number; // a vehicle with fewer km gets × youngFactor
  youngFactor?: number; // default DEFAULT_YOUNG_FACTOR
};

export type PriorInput = { id: string; baseRate: number; applicability?: Applicability };
export type VehicleFacts = { fuel?: string; drivetrain?: string; ageYears?: number; km?: number }; // unknown: no adjustment
export type PriorOptions = { outcomes?: Record<string, number>; pseudoCount?: number };
export type ResolvedPrior = { id: string; prior: number; base: number; factor: number; count: number };

export function resolvePriors(
  causes: readonly PriorInput[],
  vehicle: VehicleFacts,
  options?: PriorOptions,
): ResolvedPrior[] {
  if (causes.length === 0) fail("EMPTY_MODEL", "There are no causes to give priors to.");
  const alpha = options?.pseudoCount ?? DEFAULT_PSEUDO_COUNT;
  if (typeof alpha !== "number" || !Number.isFinite(alpha) || alpha < 0) {
    fail("INVALID_OPTION", `pseudoCount is ${String(alpha)}; it must be 0 or more.`);
  }
  const seen = new Set<string>();
  const weights = causes.map((c) => {
    if (seen.has(c.id)) fail("DUPLICATE_ID", `Two causes have the id "${c.id}".`);
    seen.add(c.id);
    nonNegative(c.baseRate, `The base rate of "${c.id}"`);
    const factor = applicabilityFactor(c, vehicle);
    return { id: c.id, factor, weight: c.baseRate * factor };
  });
  const counts = new Map<string, number>();
  let n = 0;
  for (const [id, count] of Object.entries(options?.outcomes ?? {})) {
    if (!seen.has(id)) fail("UNKNOWN_ID", `Outcome counts name "${id}", which is not among the causes.`);
    n += nonNegative(count, `The outcome count of "${id}"`);
    counts.set(id, count);
  }
  const total = weights.reduce((s, w) => s + w.weight, 0);
  if (!(total > 0) && !(n > 0)) {
    fail(
      "ZERO_PRIOR",
      "No cause applies to this vehicle and no outcomes are recorded, so every prior would be 0.",
    );
  }
  return weights.map(({ id, factor, weight }) => {
    const base = total > 0 ? weight / total : 0;
    const count = counts.get(id) ?? 0;
    // With no applicable base rates the curated part carries no information: counts alone decide.
    const a = total > 0 ? alpha : 0;
    const prior = n + a > 0 ? (count + a * base) / (n + a) : base;
    return { id, prior, base, factor, count };
  });
}

function applicabilityFactor(c: PriorInput, v: VehicleFacts): number {
  const a = c.applicability;
  if (!a) return 1;
  if (a.fuel && v.fuel !== undefined && !a.fuel.includes(v.fuel)) return 0;
  if (a.drivetrain && v.drivetrain !== undefined && !a.drivetrain.includes(v.drivetrain)) return 0;
  const young = nonNegative(a.youngFactor ?? DEFAULT_YOUNG_FACTOR, `The young factor of "${c.id}"`);
  let factor = 1;
  if (a.minAgeYears !== undefined && v.ageYears !== undefined && v.ageYears < a.minAgeYears) factor *= young;
  if (a.minKm !== undefined && v.km !== undefined && v.km < a.minKm) factor *= young;
  return factor;
}

function nonNegative(v: unknown, what: string): number {
  if (typeof v !== "number" || !Number.isFinite(v) || v < 0)
    fail("INVALID_PRIOR", `${what} is ${String(v)}; it must be 0 or more.`);
  return v;
}
