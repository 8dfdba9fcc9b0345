// Fuel consumption between L/100 km and miles per gallon (US and UK). The two are reciprocal:
//   L/100 km = 100 · (litres per gallon) / (km per mile) / mpg.
// The constants come from the unit definitions, not typed-in rounded figures: US gallon
// 3.785411784 L (NIST HB 44), UK gallon 4.54609 L (Weights and Measures Act 1985), mile
// 1.609344 km (NIST SP 811) → 235.2146 (US) and 282.4809 (UK).
import { measureFail } from "./errors";
import { math } from "./math";

export type FuelUnit = "L/100km" | "mpg_us" | "mpg_uk";

const KM_PER_MILE = math.unit(1, "mi").toNumber("km");
export const L100KM_TIMES_MPG_US = (100 * math.unit(1, "gal").toNumber("L")) / KM_PER_MILE;
export const L100KM_TIMES_MPG_UK = (100 * math.unit(1, "ukgal").toNumber("L")) / KM_PER_MILE;

function toLPer100km(value: number, from: FuelUnit): number {
  if (from === "L/100km") return value;
  return (from === "mpg_us" ? L100KM_TIMES_MPG_US : L100KM_TIMES_MPG_UK) / value;
}

export function convertFuelConsumption(value: number, from: FuelUnit, to: FuelUnit): number {
  if (typeof value !== "number" || !Number.isFinite(value) || value <= 0) {
    measureFail("INVALID_VALUE", `A fuel consumption must be a number above 0; got ${String(value)}.`);
  }
  for (const u of [from, to]) {
    if (u !== "L/100km" && u !== "mpg_us" && u !== "mpg_uk")
      measureFail("UNKNOWN_UNIT", `"${u}" is not L/100km, mpg_us or mpg_uk.`);
  }
  const l100 = toLPer100km(value, from);
  return to === "L/100km" ? l100 : toLPer100km(l100, to); // the reciprocal is its own inverse
}
