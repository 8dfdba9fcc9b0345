// Public surface of the measurement module: unit-aware rules, readings, VINs, trouble codes,
// fuel consumption and unit-system formatting. Pure (mathjs only), safe on client and server.
export { MeasureError, MEASURE_ERROR_CODES } from "./errors";
export type { MeasureErrorCode } from "./errors";
export { math } from "./math";
export { parseReading, readReading } from "./reading";
export type { Reading, ReadingInput } from "./reading";
export { compileRule, evaluateRule, findingFromReading } from "./rules";
export { BAND_EDGES, gradedFinding, gradeReading, READING_BANDS } from "./grade";
export type { GradedReading, ReadingBand } from "./grade";
export type { CompiledRule, RuleResult } from "./rules";
export { kindOf } from "./dimensions";
export { validateVin, vinCheckDigit } from "./vin";
export type { VinResult } from "./vin";
export { parseDtc } from "./dtc";
export type { Dtc, DtcResult, DtcScope, DtcSystem } from "./dtc";
export { convertFuelConsumption, L100KM_TIMES_MPG_US, L100KM_TIMES_MPG_UK } from "./fuel";
export type { FuelUnit } from "./fuel";
export { formatQuantity } from "./format";
export type { Formatted, QuantityKind, UnitSystem as QuantitySystem } from "./format";
export {
  describeRule,
  formatMileage,
  KM_PER_MILE,
  mileageUnit,
  parseDecimal,
  parseMileage,
  showQuantity,
} from "./unit-system";
export type { Parsed, UnitSystem } from "./unit-system";
export { speedsIn } from "./speeds";
