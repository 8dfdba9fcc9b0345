// What a vehicle is, as far as the knowledge base's applicability and the case screens need.

export const FUEL_TYPES = ["petrol", "diesel", "hybrid", "electric", "lpg"] as const;
export type FuelType = (typeof FUEL_TYPES)[number];

export const FUEL_LABEL: Record<FuelType, string> = {
  petrol: "Petrol",
  diesel: "Diesel",
  hybrid: "Hybrid",
  electric: "Electric",
  lpg: "LPG",
};

export const DRIVETRAINS = ["fwd", "rwd", "awd"] as const;
export type Drivetrain = (typeof DRIVETRAINS)[number];

export const DRIVETRAIN_LABEL: Record<Drivetrain, string> = {
  fwd: "Front-wheel drive",
  rwd: "Rear-wheel drive",
  awd: "Four-wheel drive",
};

/** How quantities are shown and read in a workshop (app/measure/unit-system.ts does the arithmetic). */
export const UNIT_SYSTEMS = ["metric", "imperial"] as const;
export type UnitSystem = (typeof UNIT_SYSTEMS)[number];

export const UNIT_SYSTEM_LABEL: Record<UnitSystem, string> = {
  metric: "Metric (km, kPa, mm, L/100 km)",
  imperial: "Imperial (miles, psi, inches, mpg)",
};
