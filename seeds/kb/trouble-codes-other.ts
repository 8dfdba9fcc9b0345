// Generic trouble codes (SAE J2012 / ISO 15031-6, second character 0) that point outside fuelling:
// engine mechanical, cooling, exhaust after-treatment, charging and the gearbox. Titles are
// paraphrased in lower case; beside each, its status ("secondary, via SOURCES.md" or "from memory").
import { producesSymptoms, troubleCode } from "./build";
import type { KnowledgeBaseSeed } from "./types";

export const troubleCodesOther: KnowledgeBaseSeed = {
  symptoms: [
    troubleCode("P0016", "crankshaft position – camshaft position correlation (bank 1 sensor A)", "engine_mechanical", ["cam crank correlation", "timing correlation code"]), // from memory
    troubleCode("P0524", "engine oil pressure too low", "engine_mechanical", ["low oil pressure code", "oil pressure code"]), // from memory
    troubleCode("P0128", "coolant thermostat (coolant temperature below thermostat regulating temperature)", "cooling", ["thermostat code", "engine not warming up code"]), // from memory
    troubleCode("P0217", "engine coolant over-temperature condition", "cooling", ["over temperature code", "engine overheat code"]), // from memory
    troubleCode("P0480", "cooling fan 1 control circuit", "cooling", ["fan control code", "radiator fan circuit code"]), // from memory
    troubleCode("P0420", "catalyst system efficiency below threshold (bank 1)", "exhaust", ["catalyst code", "cat efficiency code", "catalytic converter code"]), // SAE J2012 title, secondary, via SOURCES.md
    troubleCode("P2002", "diesel particulate filter efficiency below threshold (bank 1)", "exhaust", ["dpf efficiency code", "particulate filter efficiency"]), // from memory
    troubleCode("P2463", "diesel particulate filter soot accumulation (bank 1)", "exhaust", ["dpf soot code", "dpf full code"]), // from memory
    troubleCode("P0562", "system voltage low", "electrical", ["low voltage code", "battery voltage low code"]), // from memory
    troubleCode("P0563", "system voltage high", "electrical", ["system voltage high code", "overcharging code"]), // from memory
    troubleCode("P0700", "transmission control system (MIL request)", "driveline", ["gearbox code", "transmission fault code"]), // from memory
    // Any other valid code lands here, the code itself kept with the observation: one symptom for
    // every code the base does not list by itself (chassis, body and network codes, bank-2 and
    // higher-cylinder engine codes). A code nobody has written down also hints at a fault outside
    // the base: its leak is higher than a listed code's, and a fault that is not in the base is
    // taken to store such a code half the time (starter estimate).
    { key: "trouble_code_stored", name: "Trouble code stored that is not listed by itself", system: "engine_fuel_emissions", kind: "trouble_code",
      synonyms: ["other trouble code", "unlisted fault code", "scan tool shows another code", "code not on the list"], conditions: ["in the fault memory"], leak: 0.05, unlisted: 0.5 },
  ],
  causes: [],
  checks: [],

  symptomLinks: [
    ...producesSymptoms("timing_chain_stretched", { dtc_p0016: 0.6 }),
    ...producesSymptoms("timing_belt_worn", { dtc_p0016: 0.1 }),
    ...producesSymptoms("cam_sensor_failed", { dtc_p0016: 0.2 }),
    ...producesSymptoms("crank_sensor_failed", { dtc_p0016: 0.1 }),
    ...producesSymptoms("oil_pump_pickup_blocked", { dtc_p0524: 0.4 }),
    ...producesSymptoms("oil_level_low", { dtc_p0524: 0.2 }),
    ...producesSymptoms("engine_bearings_worn", { dtc_p0524: 0.3 }),
    ...producesSymptoms("oil_pressure_switch_faulty", { dtc_p0524: 0.2 }),
    ...producesSymptoms("thermostat_stuck_open", { dtc_p0128: 0.7 }),
    ...producesSymptoms("ect_sensor_fault", { dtc_p0128: 0.2 }),
    ...producesSymptoms("thermostat_stuck_closed", { dtc_p0217: 0.5 }),
    ...producesSymptoms("fan_not_running", { dtc_p0217: 0.3, dtc_p0480: 0.3 }),
    ...producesSymptoms("fan_control_failed", { dtc_p0217: 0.3, dtc_p0480: 0.6 }),
    ...producesSymptoms("head_gasket_failed", { dtc_p0217: 0.3 }),
    ...producesSymptoms("radiator_blocked", { dtc_p0217: 0.2 }),
    ...producesSymptoms("water_pump_worn", { dtc_p0217: 0.15 }),
    ...producesSymptoms("coolant_leak_external", { dtc_p0217: 0.1 }),
    ...producesSymptoms("catalyst_inefficient", { dtc_p0420: 0.9 }),
    ...producesSymptoms("catalyst_broken_up", { dtc_p0420: 0.4 }),
    ...producesSymptoms("downstream_o2_fault", { dtc_p0420: 0.15 }),
    ...producesSymptoms("exhaust_joint_leak", { dtc_p0420: 0.1 }),
    ...producesSymptoms("dpf_pressure_sensor_fault", { dtc_p2002: 0.4, dtc_p2463: 0.3 }),
    ...producesSymptoms("dpf_blocked", { dtc_p2002: 0.2, dtc_p2463: 0.7 }),
    ...producesSymptoms("alternator_not_charging", { dtc_p0562: 0.5 }),
    ...producesSymptoms("battery_terminals_poor", { dtc_p0562: 0.2 }),
    ...producesSymptoms("battery_worn", { dtc_p0562: 0.1 }),
    ...producesSymptoms("aux_belt_worn", { dtc_p0562: 0.1 }),
    ...producesSymptoms("earth_strap_failed", { dtc_p0562: 0.1 }),
    ...producesSymptoms("alternator_overcharging", { dtc_p0563: 0.7 }),
    ...producesSymptoms("auto_gearbox_fault", { dtc_p0700: 0.8, trouble_code_stored: 0.3 }),
    // Faults whose own codes are not symptoms here: chassis codes (ABS, steering, parking brake,
    // tyre sensors), body codes (airbags, keys) and the engine codes of other banks and cylinders.
    // Starter estimates of P(a code not listed by itself is stored | fault).
    ...producesSymptoms("abs_wheel_sensor", { trouble_code_stored: 0.5 }),
    ...producesSymptoms("abs_reluctor_ring", { trouble_code_stored: 0.4 }),
    ...producesSymptoms("abs_modulator_fault", { trouble_code_stored: 0.5 }),
    ...producesSymptoms("eps_fault", { trouble_code_stored: 0.4 }),
    ...producesSymptoms("steering_angle_sensor", { trouble_code_stored: 0.5 }),
    ...producesSymptoms("epb_actuator_fault", { trouble_code_stored: 0.5 }),
    ...producesSymptoms("tpms_sensor_fault", { trouble_code_stored: 0.4 }),
    ...producesSymptoms("seat_airbag_connector", { trouble_code_stored: 0.6 }),
    ...producesSymptoms("clock_spring_failed", { trouble_code_stored: 0.6 }),
    ...producesSymptoms("key_transponder_fault", { trouble_code_stored: 0.3 }),
    ...producesSymptoms("brake_light_switch_faulty", { trouble_code_stored: 0.2 }),
    ...producesSymptoms("intake_air_leak", { trouble_code_stored: 0.15 }),
    ...producesSymptoms("maf_sensor_fault", { trouble_code_stored: 0.2 }),
    ...producesSymptoms("lambda_sensor_slow", { trouble_code_stored: 0.15 }),
    ...producesSymptoms("ignition_coil_failed", { trouble_code_stored: 0.1 }),
  ],
  checkLinks: [],
};
