// Engine fuelling and emissions, part 2: the engine computer's sensors — oxygen sensors before and
// after the catalyst, the coolant-temperature sensor the engine computer reads (not the gauge's
// sender, which is in cooling.ts), and the crank and cam position sensors.
import {
  bearsOn,
  COMBUSTION,
  componentNode,
  failureMode,
  producesSymptoms,
  SAY,
  SPARK_IGNITION,
} from "./build";
import type { KnowledgeBaseSeed } from "./types";

const fm = (parent: string, f: Parameters<typeof failureMode>[2]) =>
  failureMode("engine_fuel_emissions", parent, f);
const sym = { system: "engine_fuel_emissions" } as const;

export const engineSensors: KnowledgeBaseSeed = {
  symptoms: [
    {
      ...sym,
      key: "hard_cold_start",
      name: "Hard to start from cold",
      kind: "performance",
      synonyms: [
        "long cranking",
        "slow to fire",
        "takes ages to start in the morning",
        "won't start when cold",
        "starts then dies",
      ],
      conditions: ["cold start"],
      leak: 0.03,
    },
    {
      ...sym,
      key: "cuts_out_when_hot",
      name: "Cuts out when hot and restarts once it has cooled",
      kind: "performance",
      synonyms: [
        "dies when warm",
        "engine cuts out after half an hour",
        "stops when hot",
        "cuts out in traffic then restarts later",
      ],
      conditions: ["warm engine", "after driving"],
      leak: 0.02,
    },
  ],

  causes: [
    componentNode(
      "engine_fuel_emissions",
      "engine_sensors",
      "Engine-management sensors",
      "Oxygen sensors, the engine computer's coolant-temperature sensor, and crank and cam position sensors.",
    ),
    fm("engine_sensors", {
      key: "lambda_sensor_slow",
      name: "Upstream oxygen (lambda) sensor slow or failed",
      baseRate: 3,
      repairMinutes: 30,
      partsCost: 80,
      priority: "soon",
      description:
        "The narrowband sensor before the catalyst switches slowly or sticks, so the mixture drifts: higher consumption and an engine lamp (P0130 / P0133).",
      ownerDescription: "The sensor in the exhaust that helps the engine set its fuel mixture has worn out.",
      ifLeft:
        "The engine uses more fuel, the warning lamp stays on and the catalytic converter can be damaged over time.",
      applicability: { fuel: SPARK_IGNITION, minKm: 100000, youngFactor: 0.3 },
    }),
    fm("engine_sensors", {
      key: "lambda_heater_failed",
      name: "Oxygen sensor heater circuit failed",
      baseRate: 1.5,
      repairMinutes: 30,
      partsCost: 80,
      priority: "soon",
      description:
        "The sensor's built-in heater (or its fuse or wiring) has failed, so the sensor is slow to work after a cold start: heater codes (P0030, P0135, P0141).",
      ownerDescription:
        "The small heater inside an exhaust sensor has failed, so the sensor takes too long to start working.",
      ifLeft:
        "The engine runs with a less accurate mixture after every cold start, using more fuel, and the lamp stays on.",
      applicability: { fuel: SPARK_IGNITION, minKm: 80000, youngFactor: 0.3 },
    }),
    fm("engine_sensors", {
      key: "downstream_o2_fault",
      name: "Downstream (after-catalyst) oxygen sensor faulty",
      baseRate: 1,
      repairMinutes: 30,
      partsCost: 80,
      priority: "watch",
      description:
        "The sensor behind the catalyst, which only checks the catalyst, is stuck or its circuit has failed (P0136): the lamp comes on; fuelling is hardly affected.",
      ownerDescription:
        "The sensor behind the catalytic converter, which checks that it is working, has failed.",
      ifLeft:
        "The engine runs normally, but the warning lamp stays on, which hides new faults and can fail an emissions test.",
      applicability: { fuel: SPARK_IGNITION, minKm: 100000, youngFactor: 0.3 },
    }),
    fm("engine_sensors", {
      key: "ect_sensor_fault",
      name: "Coolant temperature sensor reading wrong",
      baseRate: 1.5,
      repairMinutes: 30,
      partsCost: 30,
      priority: "soon",
      description:
        "The sensor tells the engine computer the wrong temperature (P0117 / P0118 when out of range): cold-start mixture stays on, hard starts, high consumption, fan control wrong.",
      ownerDescription: "The sensor that tells the engine computer how warm the engine is has failed.",
      ifLeft:
        "The engine gets the wrong fuel mixture, starts badly and uses more fuel; the cooling fan may not be switched on when needed.",
      applicability: { fuel: COMBUSTION },
    }),
    fm("engine_sensors", {
      key: "crank_sensor_failed",
      name: "Crankshaft position sensor failing",
      baseRate: 1.5,
      repairMinutes: 45,
      partsCost: 60,
      priority: "soon",
      description:
        "The sensor that gives engine speed and position fails, often when hot: the engine cuts out and will not restart until it cools, or cranks without firing (P0335).",
      ownerDescription:
        "The sensor that tells the engine computer how fast the engine is turning is failing.",
      ifLeft:
        "The engine can cut out while driving, without warning, and may not restart until it has cooled.",
      applicability: { fuel: COMBUSTION, minKm: 80000, youngFactor: 0.3 },
    }),
    fm("engine_sensors", {
      key: "cam_sensor_failed",
      name: "Camshaft position sensor or its signal faulty",
      baseRate: 1,
      repairMinutes: 40,
      partsCost: 60,
      priority: "soon",
      description:
        "The cam signal is missing or erratic (P0340): longer cranking before the engine computer finds its timing, reduced power on some engines.",
      ownerDescription: "A sensor that helps the engine computer time the fuel and spark has failed.",
      ifLeft:
        "Starting gets slower and some engines run in reduced power; a complete failure can stop the engine starting.",
      applicability: { fuel: COMBUSTION, minKm: 80000, youngFactor: 0.3 },
    }),
  ],

  checks: [
    {
      key: "lambda_switching",
      name: "Watch the upstream lambda sensor switch on the scan tool",
      skill: "technician",
      minutes: 15,
      consumablesCost: 0,
      access: ["scan_tool"],
      cautions: ["exhaust_fumes", "hot_parts"],
      instructions: [
        SAY.FUMES + " The exhaust and sensor are very hot.",
        "With the engine fully warm at a steady 2500 rpm, graph the upstream narrowband sensor voltage.",
        "A healthy sensor swings between about 0.1 V (lean) and 0.9 V (rich) several times a second around 0.45 V; a slow, flat or stuck trace fails.",
      ],
      tools: ["scan tool or oscilloscope", "exhaust extraction"],
      result: {
        kind: "pass_fail",
        failMeans:
          "The lambda sensor is slow or stuck: check for an exhaust leak ahead of it, then replace the sensor.",
      },
      falseAlarm: 0.08,
    },
    {
      key: "lambda_heater_resistance",
      name: "Measure the oxygen sensor heater resistance",
      skill: "technician",
      minutes: 15,
      consumablesCost: 0,
      access: ["bonnet_open", "cold_engine"],
      cautions: ["hot_parts"],
      instructions: [
        SAY.HOT_EXHAUST + " Test with the exhaust cold.",
        "Unplug the sensor and measure across its two heater pins (the maker's wiring diagram names them) with a multimeter; check the heater's fuse and supply at the plug with the ignition on.",
        "Use the maker's heater resistance figure for this sensor where it differs from the generic range.",
      ],
      tools: ["multimeter", "wiring diagram"],
      result: {
        kind: "measurement",
        quantity: "resistance",
        unit: "ohm",
        rule: "value >= 1 ohm and value <= 20 ohm", // from memory, common practice: zirconia sensor heaters typically read a few ohms cold; maker-specific — use the maker's figure
        failMeans: "The heater is open or shorted: replace the sensor (after checking its fuse and supply).",
      },
      falseAlarm: 0.04,
    },
    {
      key: "downstream_o2_check",
      name: "Check the downstream oxygen sensor's signal and heater",
      skill: "technician",
      minutes: 20,
      consumablesCost: 0,
      access: ["scan_tool"],
      cautions: ["exhaust_fumes", "hot_parts"],
      instructions: [
        SAY.FUMES + " The catalyst and sensor are very hot.",
        "Fully warm, snap the throttle and then let the engine overrun: the downstream sensor should read rich (towards 0.9 V) on the snap and lean on the overrun, even if slowly.",
        "A signal that never moves, or a heater circuit fault in the memory, fails the sensor; rule out wiring first.",
      ],
      tools: ["scan tool", "exhaust extraction"],
      result: {
        kind: "pass_fail",
        failMeans: "The downstream sensor does not respond: repair its wiring or replace the sensor.",
      },
      falseAlarm: 0.06,
    },
    {
      key: "ect_resistance",
      name: "Measure coolant temperature sensor resistance on a cold engine",
      skill: "technician",
      minutes: 15,
      consumablesCost: 0,
      access: ["bonnet_open", "cold_engine"],
      cautions: [],
      instructions: [
        "On an engine that has stood overnight at about 20 °C, unplug the engine computer's coolant temperature sensor (do not remove it from the engine).",
        "Measure resistance across its terminals with a multimeter, and compare the scan-tool temperature with the air temperature before unplugging.",
        "Use the maker's resistance table for this sensor if the engine is not near 20 °C.",
      ],
      tools: ["multimeter", "thermometer", "scan tool"],
      result: {
        kind: "measurement",
        quantity: "resistance",
        unit: "kohm",
        rule: "value >= 2 kohm and value <= 3 kohm", // common practice (SOURCES.md): a typical coolant sensor reads about 2.5 kΩ at 20 °C; sensor-specific — use the maker's table
        failMeans:
          "The sensor reading is out of range for the temperature: the engine computer is given a false temperature. Check the wiring, then replace the sensor.",
      },
      falseAlarm: 0.06,
    },
    {
      key: "ect_vs_gauge_compare",
      name: "Compare the engine computer's coolant temperature, the gauge and the real temperature",
      skill: "technician",
      minutes: 20,
      consumablesCost: 0,
      access: ["scan_tool", "bonnet_open"],
      cautions: ["exhaust_fumes", "hot_parts", "rotating_parts"],
      instructions: [
        SAY.RUNNING + " The engine and hoses get hot.",
        "Warm the engine at idle. Read the coolant temperature the engine computer sees on the scan tool, note the dashboard gauge, and measure the thermostat housing with an infrared thermometer.",
        "Scan tool wrong but gauge right points to the engine computer's sensor; gauge wrong but scan tool right points to the gauge's sender or its wiring (on cars with a separate sender).",
      ],
      tools: ["scan tool", "infrared thermometer", "exhaust extraction"],
      result: {
        kind: "pass_fail",
        failMeans:
          "One reading disagrees with the real temperature: the sensor or sender on that side is at fault.",
      },
      falseAlarm: 0.05,
    },
    {
      key: "crank_cam_signal",
      name: "Check crank and cam signals while cranking and running",
      skill: "senior",
      minutes: 30,
      consumablesCost: 0,
      access: ["scan_tool", "bonnet_open"],
      cautions: ["exhaust_fumes", "rotating_parts"],
      instructions: [
        SAY.RUNNING,
        "While cranking, watch engine speed on the scan tool: no speed shown while the engine turns points to the crank sensor or its wiring.",
        "Scope both signals at the sensor plugs: look for a clean pattern, missing teeth in the right place and no drop-outs; check the sensor tip for metal debris.",
      ],
      tools: ["scan tool", "oscilloscope", "back-probe pins", "exhaust extraction"],
      result: {
        kind: "pass_fail",
        failMeans:
          "The crank or cam signal is missing or broken up: repair the wiring or replace the sensor.",
      },
      falseAlarm: 0.05,
    },
    {
      key: "crank_sensor_heat_test",
      name: "Catch a crank sensor that fails when hot",
      skill: "senior",
      minutes: 30,
      consumablesCost: 0,
      access: ["scan_tool", "bonnet_open"],
      cautions: ["hot_parts", "exhaust_fumes", "rotating_parts"],
      instructions: [
        SAY.RUNNING +
          " The engine and the sensor area are hot; keep the heat gun away from wiring, fuel and plastic.",
        "With the engine warm and idling, watch engine speed and the crank signal while warming the sensor body gently with a heat gun.",
        "An engine that stumbles or cuts out as the sensor warms, with the signal dropping out, fails the sensor.",
      ],
      tools: ["heat gun", "scan tool", "oscilloscope", "exhaust extraction"],
      result: {
        kind: "pass_fail",
        failMeans: "The crank sensor's signal fails when hot: replace the sensor.",
      },
      falseAlarm: 0.04,
    },
    {
      key: "emissions_gas_analyser",
      name: "Measure exhaust lambda with a gas analyser at fast idle",
      skill: "technician",
      minutes: 20,
      consumablesCost: 0,
      access: [],
      cautions: ["exhaust_fumes", "hot_parts"],
      instructions: [
        SAY.FUMES +
          " The tailpipe is hot: fit the probe with gloves and keep the analyser hose off hot metal.",
        "With the engine fully warm and the analyser warmed up and leak-checked, hold the engine at fast idle (about 2500 rpm) and read lambda, CO and HC.",
        "Apply the limits for this car's age and the local emissions test; the generic lambda window is for catalysed petrol engines only.",
      ],
      tools: ["four-gas analyser", "exhaust extraction", "gloves"],
      result: {
        kind: "measurement",
        quantity: "lambda (air–fuel ratio ÷ stoichiometric)",
        unit: "",
        rule: "value >= 0.97 and value <= 1.03", // from memory: a common emissions-test window for catalysed petrol cars at fast idle; defer to local regulation
        failMeans:
          "The mixture is outside the window: rich points to fuel or sensor faults, lean to air leaks; high HC points to misfires.",
      },
      falseAlarm: 0.05,
    },
  ],

  symptomLinks: [
    ...producesSymptoms("lambda_sensor_slow", {
      check_engine_light: 0.7,
      high_fuel_consumption: 0.5,
      rotten_egg_smell: 0.2,
    }),
    ...producesSymptoms("lambda_heater_failed", { check_engine_light: 0.85, high_fuel_consumption: 0.15 }),
    ...producesSymptoms("downstream_o2_fault", { check_engine_light: 0.85 }),
    ...producesSymptoms("ect_sensor_fault", {
      high_fuel_consumption: 0.45,
      hard_cold_start: 0.4,
      check_engine_light: 0.5,
      black_smoke: 0.15,
      overheat_traffic: 0.15,
      idle_hunting: 0.2,
      fan_runs_always: 0.3,
    }),
    ...producesSymptoms("crank_sensor_failed", {
      cranks_no_start: 0.6,
      cuts_out_when_hot: 0.7,
      check_engine_light: 0.4,
      stalls_idle: 0.2,
    }),
    ...producesSymptoms("cam_sensor_failed", {
      hard_cold_start: 0.3,
      cranks_no_start: 0.3,
      check_engine_light: 0.6,
      hard_hot_start: 0.2,
    }),
  ],

  checkLinks: [
    ...bearsOn("lambda_switching", {
      lambda_sensor_slow: 0.85,
      manifold_leak: 0.2,
      lambda_heater_failed: 0.3,
    }),
    ...bearsOn("lambda_heater_resistance", { lambda_heater_failed: 0.85 }),
    ...bearsOn("downstream_o2_check", { downstream_o2_fault: 0.8 }),
    ...bearsOn("ect_resistance", { ect_sensor_fault: 0.85 }),
    ...bearsOn("ect_vs_gauge_compare", {
      ect_sensor_fault: 0.7,
      gauge_sender_faulty: 0.8,
      thermostat_stuck_open: 0.3,
    }),
    ...bearsOn("crank_cam_signal", {
      crank_sensor_failed: 0.75,
      cam_sensor_failed: 0.8,
      timing_chain_stretched: 0.3,
    }),
    ...bearsOn("crank_sensor_heat_test", { crank_sensor_failed: 0.7 }),
    ...bearsOn("emissions_gas_analyser", {
      lambda_sensor_slow: 0.5,
      injector_leaking: 0.4,
      intake_air_leak: 0.4,
      catalyst_inefficient: 0.4,
      spark_plugs_worn: 0.3,
    }),
  ],
};
