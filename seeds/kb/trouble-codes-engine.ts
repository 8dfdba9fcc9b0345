// Generic powertrain trouble codes (SAE J2012 / ISO 15031-6, second character 0) for fuelling,
// air metering, ignition and the engine computer's sensors, each linked to the failure modes that
// set it. A code is evidence, not a diagnosis: every one also links to several faults.
// Titles are paraphrased in lower case; beside each, its status: "secondary, via SOURCES.md"
// (the SAE titles quoted there) or "from memory" (not verified here, wording varies by edition).
import { producesSymptoms, troubleCode } from "./build";
import type { KnowledgeBaseSeed } from "./types";

const E = "engine_fuel_emissions" as const;

export const troubleCodesEngine: KnowledgeBaseSeed = {
  symptoms: [
    troubleCode("P0101", "mass or volume air-flow circuit range/performance", E, ["air flow sensor code", "maf code"]), // from memory
    troubleCode("P0102", "mass or volume air-flow circuit low input", E, ["maf sensor low", "air flow meter low signal"]), // from memory
    troubleCode("P0106", "manifold absolute pressure / barometric pressure circuit range/performance", E, ["map sensor code", "boost sensor code"]), // from memory
    troubleCode("P0121", "throttle/pedal position sensor A circuit range/performance", E, ["throttle position code", "tps code"]), // from memory
    troubleCode("P0171", "system too lean (bank 1)", E, ["lean code", "running lean", "too lean bank 1"]), // SAE J2012 title, secondary, via SOURCES.md
    troubleCode("P0172", "system too rich (bank 1)", E, ["rich code", "running rich", "too rich bank 1"]), // SAE J2012 title, secondary, via SOURCES.md
    troubleCode("P0087", "fuel rail/system pressure too low", E, ["low rail pressure code", "fuel pressure too low"]), // from memory
    troubleCode("P0201", "injector circuit open, cylinder 1", E, ["injector 1 circuit", "cylinder 1 injector code"]), // from memory
    troubleCode("P0300", "random/multiple cylinder misfire detected", E, ["random misfire", "multiple misfire code"]), // SAE J2012 title, secondary, via SOURCES.md
    troubleCode("P0301", "cylinder 1 misfire detected", E, ["cylinder 1 misfire", "misfire cylinder one"]), // SAE J2012 title, secondary, via SOURCES.md
    troubleCode("P0302", "cylinder 2 misfire detected", E, ["cylinder 2 misfire", "misfire cylinder two"]), // from memory (same pattern as P0301)
    troubleCode("P0303", "cylinder 3 misfire detected", E, ["cylinder 3 misfire", "misfire cylinder three"]), // from memory (same pattern as P0301)
    troubleCode("P0304", "cylinder 4 misfire detected", E, ["cylinder 4 misfire", "misfire cylinder four"]), // from memory (same pattern as P0301)
    troubleCode("P0335", "crankshaft position sensor A circuit", E, ["crank sensor code", "crankshaft sensor fault"]), // from memory
    troubleCode("P0340", "camshaft position sensor A circuit (bank 1 or single sensor)", E, ["cam sensor code", "camshaft sensor fault"]), // from memory
    troubleCode("P0117", "engine coolant temperature circuit low", E, ["coolant sensor low", "ect circuit low"]), // SAE J2012 title, secondary, via SOURCES.md
    troubleCode("P0118", "engine coolant temperature circuit high", E, ["coolant sensor high", "ect circuit high"]), // SAE J2012 title, secondary, via SOURCES.md
    troubleCode("P0130", "O2 sensor circuit (bank 1 sensor 1)", E, ["front o2 sensor code", "upstream lambda circuit"]), // from memory
    troubleCode("P0133", "O2 sensor circuit slow response (bank 1 sensor 1)", E, ["o2 sensor slow response", "lambda slow to respond"]), // from memory
    troubleCode("P0030", "HO2S heater control circuit (bank 1 sensor 1)", E, ["front lambda heater control", "o2 heater control circuit"]), // from memory
    troubleCode("P0135", "O2 sensor heater circuit (bank 1 sensor 1)", E, ["front o2 heater code", "upstream lambda heater"]), // from memory
    troubleCode("P0136", "O2 sensor circuit (bank 1 sensor 2)", E, ["rear o2 sensor code", "downstream lambda circuit"]), // from memory
    troubleCode("P0141", "O2 sensor heater circuit (bank 1 sensor 2)", E, ["rear o2 heater code", "downstream lambda heater"]), // from memory
    troubleCode("P0380", "glow plug/heater circuit A", E, ["glow plug circuit code", "heater plug circuit"]), // from memory
    troubleCode("P0670", "glow plug module control circuit", E, ["glow plug module code", "glow relay code"]), // from memory
    troubleCode("P0401", "exhaust gas recirculation flow insufficient detected", E, ["egr flow code", "egr insufficient flow"]), // from memory
    troubleCode("P0299", "turbocharger/supercharger underboost", E, ["underboost code", "turbo underboost"]), // from memory
    troubleCode("P0234", "turbocharger/supercharger overboost condition", E, ["overboost code", "turbo overboost"]), // from memory
    troubleCode("P0441", "evaporative emission system incorrect purge flow", E, ["purge flow code", "evap purge code"]), // from memory
    troubleCode("P0442", "evaporative emission system leak detected (small leak)", E, ["small evap leak", "evap small leak code"]), // from memory
    troubleCode("P0455", "evaporative emission system leak detected (large leak)", E, ["large evap leak", "fuel cap code"]), // from memory
    troubleCode("P0456", "evaporative emission system leak detected (very small leak)", E, ["very small evap leak", "tiny evap leak"]), // from memory
    troubleCode("P0505", "idle air control system", E, ["idle control code", "idle air code"]), // from memory
    troubleCode("P0506", "idle control system rpm lower than expected", E, ["idle too low code", "low idle code"]), // from memory
    troubleCode("P0507", "idle control system rpm higher than expected", E, ["idle too high code", "high idle code"]), // from memory
  ],
  causes: [],
  checks: [],

  symptomLinks: [
    ...producesSymptoms("maf_sensor_fault", { dtc_p0101: 0.6, dtc_p0102: 0.4, dtc_p0171: 0.4, dtc_p0172: 0.2 }),
    ...producesSymptoms("intake_air_leak", { dtc_p0101: 0.3, dtc_p0106: 0.2, dtc_p0171: 0.7, dtc_p0300: 0.3, dtc_p0505: 0.15, dtc_p0507: 0.4 }),
    ...producesSymptoms("air_filter_blocked", { dtc_p0101: 0.15 }),
    ...producesSymptoms("turbo_hose_split", { dtc_p0101: 0.2, dtc_p0299: 0.6 }),
    ...producesSymptoms("map_sensor_fault", { dtc_p0106: 0.6, dtc_p0172: 0.2, dtc_p0234: 0.15 }),
    ...producesSymptoms("pedal_throttle_sensor_fault", { dtc_p0121: 0.6 }),
    ...producesSymptoms("throttle_body_dirty", { dtc_p0121: 0.1, dtc_p0505: 0.4, dtc_p0506: 0.4, dtc_p0507: 0.3 }),
    ...producesSymptoms("fuel_pump_weak", { dtc_p0171: 0.4, dtc_p0087: 0.5, dtc_p0300: 0.3 }),
    ...producesSymptoms("fuel_filter_blocked", { dtc_p0171: 0.2, dtc_p0087: 0.5 }),
    ...producesSymptoms("injector_clogged", { dtc_p0171: 0.3, dtc_p0300: 0.2, dtc_p0301: 0.12, dtc_p0302: 0.12, dtc_p0303: 0.12, dtc_p0304: 0.12 }),
    ...producesSymptoms("breather_fault", { dtc_p0171: 0.4, dtc_p0507: 0.2 }),
    ...producesSymptoms("brake_servo_vacuum", { dtc_p0171: 0.2 }),
    ...producesSymptoms("manifold_leak", { dtc_p0171: 0.1, dtc_p0133: 0.15 }),
    ...producesSymptoms("injector_leaking", { dtc_p0172: 0.5 }),
    ...producesSymptoms("ect_sensor_fault", { dtc_p0172: 0.2, dtc_p0117: 0.4, dtc_p0118: 0.45 }),
    ...producesSymptoms("evap_purge_valve_stuck", { dtc_p0172: 0.3, dtc_p0441: 0.6, dtc_p0455: 0.1 }),
    ...producesSymptoms("diesel_injector_leakoff", { dtc_p0087: 0.3 }),
    ...producesSymptoms("injector_circuit_fault", { dtc_p0201: 0.25, dtc_p0301: 0.2, dtc_p0302: 0.2, dtc_p0303: 0.2, dtc_p0304: 0.2 }),
    ...producesSymptoms("spark_plugs_worn", { dtc_p0300: 0.5, dtc_p0301: 0.1, dtc_p0302: 0.1, dtc_p0303: 0.1, dtc_p0304: 0.1 }),
    ...producesSymptoms("ignition_coil_failed", { dtc_p0300: 0.2, dtc_p0301: 0.2, dtc_p0302: 0.2, dtc_p0303: 0.2, dtc_p0304: 0.2 }),
    ...producesSymptoms("ignition_lead_tracking", { dtc_p0300: 0.2, dtc_p0301: 0.12, dtc_p0302: 0.12, dtc_p0303: 0.12, dtc_p0304: 0.12 }),
    ...producesSymptoms("head_gasket_failed", { dtc_p0300: 0.2, dtc_p0301: 0.1, dtc_p0302: 0.1, dtc_p0303: 0.1, dtc_p0304: 0.1 }),
    ...producesSymptoms("timing_chain_stretched", { dtc_p0300: 0.1, dtc_p0340: 0.1 }),
    ...producesSymptoms("crank_sensor_failed", { dtc_p0335: 0.7 }),
    ...producesSymptoms("cam_sensor_failed", { dtc_p0340: 0.7 }),
    ...producesSymptoms("timing_belt_worn", { dtc_p0340: 0.05 }),
    ...producesSymptoms("lambda_sensor_slow", { dtc_p0130: 0.4, dtc_p0133: 0.6 }),
    ...producesSymptoms("lambda_heater_failed", { dtc_p0030: 0.3, dtc_p0135: 0.6, dtc_p0141: 0.3 }),
    ...producesSymptoms("downstream_o2_fault", { dtc_p0136: 0.6, dtc_p0141: 0.4 }),
    ...producesSymptoms("exhaust_joint_leak", { dtc_p0136: 0.1 }),
    ...producesSymptoms("glow_control_failed", { dtc_p0380: 0.6, dtc_p0670: 0.5 }),
    ...producesSymptoms("glow_plugs_failed", { dtc_p0380: 0.3 }),
    ...producesSymptoms("egr_valve_sticking", { dtc_p0401: 0.6 }),
    ...producesSymptoms("turbo_actuator_sticking", { dtc_p0299: 0.5, dtc_p0234: 0.5 }),
    ...producesSymptoms("turbo_worn", { dtc_p0299: 0.4 }),
    ...producesSymptoms("evap_leak_hose_canister", { dtc_p0442: 0.5, dtc_p0455: 0.4, dtc_p0456: 0.4 }),
    ...producesSymptoms("fuel_cap_seal_faulty", { dtc_p0442: 0.3, dtc_p0455: 0.6, dtc_p0456: 0.3 }),
  ],
  checkLinks: [],
};
