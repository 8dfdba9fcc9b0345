// Public surface of the measurement module: unit-aware rules, readings, VINs, trouble codes,
// fuel consumption and unit-system formatting. Pure (mathjs only), safe on client and server.
export { MeasureError, MEASURE_ERROR_CODES } from "./errors";
export type { MeasureErrorCode } from "./errors";
export { math } from "./math";
export { parseReading } from "./reading";
export type { ReadingInput } from "./reading";
export { compileRule, evaluateRule, findingFromReading } from "./rules";
export type { CompiledRule, RuleResult } from "./rules";
export { kindOf } from "./dimensions";
export { validateVin, vinCheckDigit } from "./vin";
export type { VinResult } from "./vin";
export { parseDtc } from "./dtc";
export type { Dtc, DtcResult, DtcScope, DtcSystem } from "./dtc";
export { convertFuelConsumption, L100KM_TIMES_MPG_US, L100KM_TIMES_MPG_UK } from "./fuel";
export type { FuelUnit } from "./fuel";
export { formatQuantity } from "./format";
export type { Formatted, QuantityKind, UnitSystem } from "./format";
