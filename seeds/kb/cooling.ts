// Cooling, part 1: thermostat, radiator fan and its control, and the temperature gauge's sender
// (the engine computer's own coolant sensor is in engine-sensors.ts). Part 2 (the sealed circuit
// and the heater) is cooling-circuit.ts.
import { bearsOn, COMBUSTION, componentNode, failureMode, producesSymptoms, SAY, systemNode, gradedOn } from "./build";
import type { KnowledgeBaseSeed } from "./types";

const fm = (parent: string, f: Parameters<typeof failureMode>[2]) => failureMode("cooling", parent, f);
const sym = { system: "cooling" } as const;

export const cooling: KnowledgeBaseSeed = {
  symptoms: [
    { ...sym, key: "overheat_traffic", name: "Engine overheats in traffic", kind: "performance",
      synonyms: ["running hot in traffic", "temperature gauge goes up at idle", "gets hot in queues", "boils over in traffic", "steaming at the lights"],
      conditions: ["in traffic", "at idle", "hot weather"], leak: 0.02 },
    { ...sym, key: "overheat_load", name: "Engine overheats at speed or climbing hills", kind: "performance",
      synonyms: ["running hot on the motorway", "overheating uphill", "temperature gauge in the red", "overheating when towing"],
      conditions: ["at speed", "uphill", "towing"], leak: 0.02 },
    { ...sym, key: "coolant_temp_lamp", name: "Coolant temperature warning lamp on", kind: "warning_lamp",
      synonyms: ["temperature light", "red thermometer light", "engine temperature warning", "coolant warning light", "overheating lamp"],
      conditions: ["while driving", "in traffic"], leak: 0.02 },
    { ...sym, key: "temp_gauge_wrong", name: "Temperature gauge stays low, jumps or reads off the scale", kind: "electrical",
      synonyms: ["temp gauge not working", "temperature needle stays on cold", "gauge goes to hot and back", "temperature gauge erratic"],
      conditions: ["while driving"], leak: 0.03 },
    { ...sym, key: "fan_runs_always", name: "Radiator fan runs all the time or long after switch-off", kind: "electrical",
      synonyms: ["fan always on", "cooling fan won't stop", "fan running with the engine cold", "fan runs after I lock the car"],
      conditions: ["cold engine", "after switch-off"], leak: 0.04 }, // a few minutes' run-on after a hot drive is normal on many cars
    { ...sym, key: "heater_cold", name: "Heater blows cold and the engine is slow to warm", kind: "performance",
      synonyms: ["no heat", "heater weak", "temperature gauge stays low", "takes ages to warm up", "cold air from the vents"],
      conditions: ["cold weather", "at speed"], leak: 0.03 },
  ],

  causes: [
    systemNode("cooling", "Cooling", "Engine cooling circuit and the cabin heater it feeds."),
    componentNode("cooling", "cooling_thermostat", "Thermostat", "The valve that keeps coolant in the engine until it reaches working temperature."),
    componentNode("cooling", "cooling_fan", "Radiator fan", "The electric fan, its relay or control module and fuse."),
    componentNode("cooling", "cooling_gauge", "Temperature gauge sender", "The sender and wiring that drive the dashboard temperature gauge, where separate from the engine computer's sensor."),
    fm("cooling_thermostat", { key: "thermostat_stuck_open", name: "Thermostat stuck open", baseRate: 3, repairMinutes: 75, partsCost: 40, priority: "watch",
      description: "The engine never reaches working temperature on the move: weak heater, higher fuel use from cold-running mixture, more wear (P0128).",
      ownerDescription: "The valve that lets the engine warm up is stuck open, so the engine runs too cool.",
      ifLeft: "The heater stays weak, the car uses more fuel and the engine wears a little faster; it is not dangerous.",
      applicability: { fuel: COMBUSTION, minKm: 80000, youngFactor: 0.3 } }),
    fm("cooling_thermostat", { key: "thermostat_stuck_closed", name: "Thermostat stuck closed", baseRate: 1, repairMinutes: 75, partsCost: 40, priority: "stop",
      description: "Coolant cannot reach the radiator: the engine overheats within minutes whatever the speed. Driving on can wreck the engine.",
      ownerDescription: "The valve that controls the engine's cooling is stuck shut, so the engine overheats.",
      ifLeft: "The engine will overheat quickly and can be badly damaged. It should not be driven until this is fixed.",
      applicability: { fuel: COMBUSTION } }),
    fm("cooling_fan", { key: "fan_not_running", name: "Radiator fan motor failed", baseRate: 2, repairMinutes: 60, partsCost: 90, priority: "soon",
      description: "The fan motor has seized or burnt out: fine on the open road, overheats when standing in traffic.",
      ownerDescription: "The electric fan behind the radiator has stopped working.",
      ifLeft: "The engine overheats in slow traffic and queues, which can damage it." }),
    fm("cooling_fan", { key: "fan_control_failed", name: "Fan relay, control module or fuse failed", baseRate: 1.5, repairMinutes: 45, partsCost: 60, priority: "soon",
      description: "The fan motor is sound but its fuse, relay or control module does not switch it (or leaves it stuck on): overheating in traffic, or a fan that never stops (P0480).",
      ownerDescription: "The switch or fuse that turns the radiator fan on and off has failed.",
      ifLeft: "The fan may not come on when the engine gets hot in traffic, or may run all the time and flatten the battery." }),
    fm("cooling_gauge", { key: "gauge_sender_faulty", name: "Temperature gauge sender or its wiring faulty", baseRate: 1, repairMinutes: 30, partsCost: 25, priority: "watch",
      description: "The gauge's own sender (not the engine computer's sensor) or its wire reads wrong: the gauge stays low, jumps or shows hot while the engine is at normal temperature.",
      ownerDescription: "The sensor that drives the temperature gauge on the dashboard is faulty, so the gauge is wrong although the engine is fine.",
      ifLeft: "You cannot trust the gauge, so a real overheat could go unnoticed.",
      applicability: { minAgeYears: 8 } }),
  ],

  checks: [
    { key: "warm_up_temperature", name: "Coolant temperature after a steady 15-minute drive", skill: "technician", minutes: 20, consumablesCost: 0,
      access: ["scan_tool", "road_test", "cold_engine"], cautions: [],
      instructions: [
        "Start from cold with the scan tool showing coolant temperature (and feel the top hose at the start).",
        "Drive steadily for 15 minutes at 60–90 km/h with the heater on low, then read the coolant temperature while still moving.",
        "Compare with the maker's thermostat opening figure where it differs from the generic limit.",
      ],
      tools: ["scan tool"],
      result: { kind: "measurement", quantity: "temperature", unit: "degC",
        rule: "value >= 80 degC", // from memory, common practice: thermostats commonly open at about 82–92 °C; maker-specific — use the maker's figure
        gradeScale: "20 degC", // 60 °C after the drive is "far beyond": the thermostat is not closing
        failMeans: "The engine runs cold on the move: the thermostat is stuck open, unless the sensor itself reads low (check it)." },
      falseAlarm: 0.06 },
    { key: "fan_switch_on", name: "Warm the engine at idle and confirm the radiator fan switches on", skill: "technician", minutes: 20, consumablesCost: 0,
      access: ["bonnet_open", "scan_tool"], cautions: ["rotating_parts", "hot_parts", "exhaust_fumes"],
      instructions: [
        "Follow the vehicle maker's procedure; exhaust extraction connected, hands, hair and leads clear of the fan — it can start at any time, even with the ignition off.",
        "Idle the engine and watch coolant temperature on the scan tool: the fan should run before the temperature passes normal; the engine gets hot.",
        "If it does not, command the fan with the scan tool before testing the circuit.",
      ],
      tools: ["scan tool", "exhaust extraction"],
      result: { kind: "pass_fail", failMeans: "The fan does not switch on when it should: test the fan motor, relay, module and fuse before the car goes back into traffic." },
      falseAlarm: 0.04 },
    { key: "fan_circuit_test", name: "Feed the fan directly, then test its fuse, relay or module", skill: "technician", minutes: 25, consumablesCost: 0,
      access: ["bonnet_open"], cautions: ["rotating_parts"],
      instructions: [
        "Follow the vehicle maker's procedure; keep hands, hair and leads clear of the fan blades — it spins the moment it is fed.",
        "Unplug the fan and feed it from the battery through a fused lead: a motor that runs is sound, one that does not (or draws heavily) has failed.",
        "With a sound motor, check the fan fuse, the relay or the control module's supply, earth and command signal from the fuse chart and wiring diagram.",
      ],
      tools: ["fused jumper leads", "multimeter", "wiring diagram"],
      result: { kind: "pass_fail", failMeans: "The fan motor, or its fuse, relay or control module, has failed: replace the part found." },
      falseAlarm: 0.04 },
    { key: "radiator_ir_scan", name: "Scan the radiator face and hoses with an infrared thermometer", skill: "technician", minutes: 15, consumablesCost: 0,
      access: ["bonnet_open"], cautions: ["hot_parts", "rotating_parts", "exhaust_fumes"],
      instructions: [
        SAY.RUNNING,
        "At working temperature, scan the hot radiator from top to bottom and side to side, and compare the top and bottom hose.",
        "Cold bands across the core mean blocked tubes; a cold top hose while the engine is hot means the thermostat is not opening.",
      ],
      tools: ["infrared thermometer or thermal camera", "exhaust extraction"],
      result: { kind: "pass_fail", failMeans: "Part of the radiator or the top hose stays cold: blocked radiator or thermostat stuck shut." },
      falseAlarm: 0.06 },
    { key: "gauge_sender_test", name: "Test the temperature gauge sender and its wire", skill: "technician", minutes: 20, consumablesCost: 0,
      access: ["bonnet_open", "scan_tool"], cautions: ["hot_parts"],
      instructions: [
        "Follow the vehicle maker's procedure; the sender sits on the engine, which may be hot.",
        "With the engine warm, compare the gauge with the scan-tool coolant temperature. Then, ignition on and engine off, unplug the sender and fit the test resistor the maker gives: the gauge should move to the matching mark.",
        "A gauge that follows the test resistor points to the sender; one that does not points to the wire or the instrument.",
      ],
      tools: ["multimeter", "test resistor", "scan tool"],
      result: { kind: "pass_fail", failMeans: "The gauge's sender or its wire is faulty: replace the sender or repair the wire." },
      falseAlarm: 0.05 },
  ],

  symptomLinks: [
    ...producesSymptoms("thermostat_stuck_open", { heater_cold: 0.8, high_fuel_consumption: 0.6, check_engine_light: 0.25, temp_gauge_wrong: 0.4 }),
    ...producesSymptoms("thermostat_stuck_closed", { overheat_traffic: 0.7, overheat_load: 0.8, coolant_loss: 0.2, coolant_smell: 0.3, coolant_temp_lamp: 0.7 }),
    ...producesSymptoms("fan_not_running", { overheat_traffic: 0.85, overheat_load: 0.1, coolant_temp_lamp: 0.5 }),
    ...producesSymptoms("fan_control_failed", { overheat_traffic: 0.8, fan_runs_always: 0.4, coolant_temp_lamp: 0.4 }),
    ...producesSymptoms("gauge_sender_faulty", { temp_gauge_wrong: 0.85, coolant_temp_lamp: 0.3 }),
  ],

  checkLinks: [
    ...bearsOn("warm_up_temperature", { ect_sensor_fault: 0.35 }),
    ...gradedOn("warm_up_temperature", { thermostat_stuck_open: { well_within: 0.03, near: 0.12, beyond: 0.35, far_beyond: 0.5 } }),
    ...bearsOn("fan_switch_on", { cooling_fan: 0.9 }),
    ...bearsOn("fan_circuit_test", { fan_not_running: 0.85, fan_control_failed: 0.85 }),
    ...bearsOn("radiator_ir_scan", { radiator_blocked: 0.75, thermostat_stuck_closed: 0.7 }),
    ...bearsOn("gauge_sender_test", { gauge_sender_faulty: 0.85 }),
  ],
};
