// Diagnostic trouble codes (SAE J2012 / ISO 15031-6): a letter for the system — P powertrain,
// C chassis, B body, U network — then four characters. The second is 0–3 (two bits in the
// two-byte encoding): 0 generic (defined by the standard), 1 maker-specific; 2 and 3 are
// generic or maker-specific depending on system and edition. The last three are hexadecimal.
export type DtcSystem = "powertrain" | "chassis" | "body" | "network";
export type DtcScope = "generic" | "manufacturer" | "depends on system and edition";

export type Dtc = {
  code: string; // normalised, e.g. "P0301"
  system: DtcSystem;
  scope: DtcScope;
  group?: string; // for generic powertrain codes P0xxx: the subsystem family of the third character
};

export type DtcResult = ({ valid: true } & Dtc) | { valid: false; message: string };

const SYSTEMS: Record<string, DtcSystem> = { P: "powertrain", C: "chassis", B: "body", U: "network" };

// Families of generic powertrain codes by third character, as commonly listed from SAE J2012
// (recalled from memory; wording varies by edition).
const P0_GROUPS: Record<string, string> = {
  "0": "fuel and air metering, auxiliary emission controls",
  "1": "fuel and air metering",
  "2": "fuel and air metering (injector circuit)",
  "3": "ignition system or misfire",
  "4": "auxiliary emission controls",
  "5": "vehicle speed, idle control and auxiliary inputs",
  "6": "computer and output circuits",
  "7": "transmission",
  "8": "transmission",
  "9": "transmission",
  A: "hybrid propulsion",
};

export function parseDtc(input: string): DtcResult {
  const code = String(input ?? "")
    .trim()
    .toUpperCase();
  if (!/^[A-Z][0-9A-Z]{4}$/.test(code)) {
    return {
      valid: false,
      message: `"${input}" is not a trouble code; codes look like P0301: a letter and four characters.`,
    };
  }
  const system = SYSTEMS[code[0]];
  if (!system) return { valid: false, message: `A trouble code starts with P, C, B or U, not ${code[0]}.` };
  if (!/[0-3]/.test(code[1]))
    return { valid: false, message: `The second character of a trouble code is 0 to 3, not ${code[1]}.` };
  if (!/^[0-9A-F]{3}$/.test(code.slice(2))) {
    return {
      valid: false,
      message: `The last three characters of a trouble code are 0–9 or A–F; "${code.slice(2)}" is not.`,
    };
  }
  const scope: DtcScope =
    code[1] === "0" ? "generic" : code[1] === "1" ? "manufacturer" : "depends on system and edition";
  const result: { valid: true } & Dtc = { valid: true, code, system, scope };
  if (code.startsWith("P0") && P0_GROUPS[code[2]]) result.group = P0_GROUPS[code[2]];
  return result;
}
