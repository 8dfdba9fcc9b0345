// The knowledge base's vocabulary: the systems of the car, kinds of symptom, the owner priority of
// a cause, how a check is reached and what care it needs. The database enums, the knowledge-base
// document format, the screens and the seeds all read these lists.
import type { Drivetrain, FuelType } from "./vehicles";

export const SYSTEMS = [
  "brakes",
  "suspension_steering",
  "wheels_tyres",
  "driveline",
  "engine_fuel_emissions",
  "engine_mechanical",
  "cooling",
  "electrical",
  "exhaust",
  "body",
] as const;
export type System = (typeof SYSTEMS)[number];

export const SYSTEM_LABEL: Record<System, string> = {
  brakes: "Brakes",
  suspension_steering: "Suspension and steering",
  wheels_tyres: "Wheels and tyres",
  driveline: "Driveline",
  engine_fuel_emissions: "Engine, fuelling and emissions",
  engine_mechanical: "Engine mechanical",
  cooling: "Cooling",
  electrical: "Electrical",
  exhaust: "Exhaust",
  body: "Body",
};

export const SYMPTOM_KINDS = [
  "noise",
  "vibration",
  "pull", // pulls, wanders, heavy or vague steering, bouncy ride: how the car handles
  "warning_lamp", // a lamp on the instrument panel, by name
  "trouble_code", // a stored DTC (SAE J2012 / ISO 15031-6), typed as the code itself
  "smell",
  "leak",
  "consumption", // uses more fuel or oil than it should
  "electrical",
  "performance", // runs, starts, drives or works worse than it should
  "visible", // seen on the car: wear, damage, smoke, corrosion
] as const;
export type SymptomKind = (typeof SYMPTOM_KINDS)[number];

export const SYMPTOM_KIND_LABEL: Record<SymptomKind, string> = {
  noise: "Noise",
  vibration: "Vibration",
  pull: "Pull or handling",
  warning_lamp: "Warning lamp",
  trouble_code: "Trouble code",
  smell: "Smell",
  leak: "Leak",
  consumption: "Consumption",
  electrical: "Electrical",
  performance: "Performance",
  visible: "Seen on the car",
};

/** How the owner should treat a cause, most urgent first; each has its own shape (app/components/priority.tsx). */
export const PRIORITIES = ["stop", "soon", "watch", "sound"] as const;
export type Priority = (typeof PRIORITIES)[number];

export const PRIORITY_COPY: Record<Priority, { label: string; description: string }> = {
  stop: { label: "Stop", description: "Unsafe to drive. Do not use the car until this is fixed." },
  soon: { label: "Soon", description: "Needs fixing soon; book it in within weeks, not months." },
  watch: { label: "Watch", description: "Fine for now. We will look again at the next visit." },
  sound: { label: "Sound", description: "Checked and in good order." },
};

export const CAUSE_LEVELS = ["system", "component", "failure_mode"] as const;
export type CauseLevel = (typeof CAUSE_LEVELS)[number];
export const CAUSE_LEVEL_LABEL: Record<CauseLevel, string> = {
  system: "System",
  component: "Component",
  failure_mode: "Failure mode",
};

/** What a check needs to be done: its access, shown with its tools. */
export const CHECK_ACCESS = [
  "ramp",
  "road_test",
  "scan_tool",
  "wheels_off",
  "bonnet_open",
  "cold_engine",
] as const;
export type CheckAccess = (typeof CHECK_ACCESS)[number];

export const CHECK_ACCESS_LABEL: Record<CheckAccess, string> = {
  ramp: "ramp",
  road_test: "road test",
  scan_tool: "scan tool",
  wheels_off: "wheels off",
  bonnet_open: "bonnet open",
  cold_engine: "cold engine",
};

export const RESULT_KINDS = ["pass_fail", "measurement"] as const;
export type ResultKind = (typeof RESULT_KINDS)[number];

export const CAUTIONS = [
  "lifting",
  "hot_parts",
  "fuel",
  "brake_hydraulics",
  "airbag",
  "high_voltage",
  "rotating_parts",
  "pressurised_cooling",
  "exhaust_fumes",
  "battery_acid",
] as const;
export type Caution = (typeof CAUTIONS)[number];

/** A caution's name in a sentence ("its work calls for a caution: hot parts"). */
export const CAUTION_LABEL: Record<Caution, string> = {
  lifting: "lifting",
  hot_parts: "hot parts",
  fuel: "fuel",
  brake_hydraulics: "brake hydraulics",
  airbag: "airbags",
  high_voltage: "high voltage",
  rotating_parts: "rotating parts",
  pressurised_cooling: "cooling system under pressure",
  exhaust_fumes: "exhaust fumes",
  battery_acid: "battery acid",
};

// Shown with every check that carries the caution, in a form that cannot be missed. They point to
// the maker's procedure and local rules: Ramplight suggests; a qualified person decides.
export const CAUTION_TEXT: Record<Caution, string> = {
  lifting:
    "Lifting: use the maker's lift points, axle stands or a locked ramp; never work under a car held only by a jack.",
  hot_parts:
    "Hot parts: exhaust, engine and brakes stay hot long after a drive. Let them cool or wear gloves.",
  fuel: "Fuel: no flames or sparks; relieve system pressure by the maker's procedure; have an extinguisher to hand.",
  brake_hydraulics:
    "Brake hydraulics: follow the maker's bleeding procedure; fluid damages paint and eyes. Test the pedal before the car moves.",
  airbag:
    "Airbags: disconnect the battery and wait the maker's stated time before working near airbag parts.",
  high_voltage:
    "High voltage: only trained and authorised people work on orange-cabled systems, with the maker's isolation procedure.",
  rotating_parts:
    "Rotating parts: keep hands, hair and clothing clear of belts, fans and wheels that can turn.",
  pressurised_cooling:
    "Cooling system under pressure: never open a hot filler cap; let the engine cool first.",
  exhaust_fumes: "Exhaust fumes: run engines only with extraction or outdoors.",
  battery_acid: "Battery: acid and explosive gas; eye protection, no sparks, disconnect the negative first.",
};

/** When a cause applies to a vehicle: its prior is scaled by this (app/kb/model.ts). */
export type Applicability = {
  fuel?: FuelType[]; // absent: any fuel
  drivetrain?: Drivetrain[]; // absent: any drivetrain
  minAgeYears?: number;
  minKm?: number; // below this the cause is rarer: prior scaled by youngFactor
  youngFactor?: number; // default 0.3
};
