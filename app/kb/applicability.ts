// Which vehicles a failure mode applies to, in words and as a senior types it: fuels and drivetrains
// (none ticked: any), and the age and mileage below which it is rarer, in the workshop's units.
// Pure: the cause page, its form and the history share it.
import type { Applicability } from "~/domain/knowledge";
import { DRIVETRAIN_LABEL, DRIVETRAINS, FUEL_LABEL, FUEL_TYPES, type UnitSystem } from "~/domain/vehicles";
import { formatMileage, parseDecimal, parseMileage } from "~/measure/mileage";

export function describeApplicability(a: Applicability, units: UnitSystem): string {
  const parts = [
    a.fuel?.length ? a.fuel.map((f) => FUEL_LABEL[f] ?? f).join(" or ") : "any fuel",
    a.drivetrain?.length ? a.drivetrain.map((d) => DRIVETRAIN_LABEL[d] ?? d).join(" or ") : "any drivetrain",
  ];
  if (a.minAgeYears) parts.push(`rarer before ${a.minAgeYears} years old`);
  if (a.minKm) parts.push(`rarer before ${formatMileage(a.minKm, units)}`);
  return parts.join("; ");
}

/** The applicability a cause form says, or the messages by field. */
export function readApplicability(
  data: FormData,
  units: UnitSystem,
  current: Applicability,
): { ok: true; value: Applicability } | { ok: false; errors: Record<string, string[]> } {
  const fuel = FUEL_TYPES.filter((f) => data.getAll("fuel").includes(f));
  const drivetrain = DRIVETRAINS.filter((d) => data.getAll("drivetrain").includes(d));
  const errors: Record<string, string[]> = {};
  const value: Applicability = {
    ...(fuel.length ? { fuel } : {}),
    ...(drivetrain.length ? { drivetrain } : {}),
  };
  const age = String(data.get("minAgeYears") ?? "").trim();
  if (age) {
    const n = parseDecimal(age);
    if (n === null || n < 0 || n > 60) errors.minAgeYears = ["An age is a number of years from 0 to 60."];
    else if (n > 0) value.minAgeYears = n;
  }
  const mileage = String(data.get("minMileage") ?? "").trim();
  if (mileage) {
    const read = parseMileage(mileage, units);
    if (!read.ok) errors.minMileage = [read.message];
    else if (read.value > 0) value.minKm = read.value;
  }
  // How much rarer below the thresholds is not on the form: a senior's own figure stays.
  if (current.youngFactor !== undefined && (value.minAgeYears || value.minKm))
    value.youngFactor = current.youngFactor;
  return Object.keys(errors).length ? { ok: false, errors } : { ok: true, value };
}
