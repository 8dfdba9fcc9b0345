// Ramplight's own mathjs instance. create(all) gives an isolated copy, so the units we add here
// (the UK gallon) do not change the global mathjs that other code may import.
import { all, create, type MathJsInstance, type Unit } from "mathjs";

export const math: MathJsInstance = create(all);

// mathjs knows only the US gallon (3.785411784 L, NIST Handbook 44 App. C). The UK gallon is
// 4.54609 L exactly (Weights and Measures Act 1985, Schedule 1).
math.createUnit("ukgal", "4.54609 liter");
// The UK pint is an eighth of the UK gallon: 0.56826125 L (same Schedule).
math.createUnit("ukpint", "0.56826125 liter");

export type { Unit };

export const isUnit = (x: unknown): x is Unit => math.isUnit(x);

/** The unit part of a reading as text ("mm", "lbf ft"), or "" for a plain number. */
export const unitText = (u: Unit): string => (u.units.length === 0 ? "" : u.formatUnits());
