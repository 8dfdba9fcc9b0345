// Mileage and plain numbers in the workshop's unit system: arithmetic only, no mathjs, so the
// browser can use it without shipping the unit library. 1 mile = 1.609344 km exactly (NIST SP 811 §B.6).
import type { UnitSystem } from "~/domain/vehicles";

export type { UnitSystem };

export const KM_PER_MILE = 1.609344;

/** The word for distances driven: "km" or "miles". */
export const mileageUnit = (system: UnitSystem) => (system === "imperial" ? "miles" : "km");

const grouped = new Intl.NumberFormat("en-GB", { maximumFractionDigits: 0 });

/** A mileage stored in km, shown in the workshop's system: "68,940 km", "42,837 miles". */
export function formatMileage(km: number, system: UnitSystem): string {
  const value = system === "imperial" ? km / KM_PER_MILE : km;
  return `${grouped.format(Math.round(value))} ${mileageUnit(system)}`;
}

export type Parsed<T> = { ok: true; value: T } | { ok: false; message: string };

// Whole numbers with thousands separators as people write them: 84000, 84,000, 84 000.
const WHOLE = /^(\d{1,3}(?:[, \u00a0\u202f]\d{3})+|\d+)$/;
const DISTANCE_WORDS: Record<string, UnitSystem> = {
  km: "metric",
  kms: "metric",
  kilometres: "metric",
  kilometers: "metric",
  mi: "imperial",
  mile: "imperial",
  miles: "imperial",
};

/**
 * A mileage as typed ("84,000", "84 000 miles", "135000 km") in km, the unit it is stored in.
 * Without a unit word the number is in the workshop's own system.
 */
export function parseMileage(text: string, system: UnitSystem): Parsed<number> {
  const t = text.trim().toLowerCase();
  const m = /^([\d, \u00a0\u202f]+?)\s*([a-z]+)?$/.exec(t);
  const unit = m?.[2] ? DISTANCE_WORDS[m[2]] : system;
  if (!m || !unit || !WHOLE.test(m[1].trim())) {
    return {
      ok: false,
      message: `Mileage is a whole number of ${mileageUnit(system)}, such as ${system === "imperial" ? "84,000" : "135,000"}.`,
    };
  }
  const n = Number(m[1].replace(/[^\d]/g, ""));
  const km = unit === "imperial" ? Math.round(n * KM_PER_MILE) : n;
  if (km > 3_000_000)
    return { ok: false, message: "That mileage is more than any car covers; check the digits." };
  return { ok: true, value: km };
}

/** A decimal as typed in a form, with thousands separators allowed: "1,250.50" → 1250.5. */
export function parseDecimal(text: string): number | null {
  const t = text.trim().replace(/[\u00a0\u202f ]/g, "");
  if (!/^[-+]?(\d{1,3}(,\d{3})+|\d+)(\.\d+)?$/.test(t)) return null;
  return Number(t.replace(/,/g, ""));
}
