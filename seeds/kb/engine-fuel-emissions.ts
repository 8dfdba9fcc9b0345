// Engine fuelling and emissions, part 1: ignition, and air intake and metering (air-flow and
// manifold-pressure sensing, throttle, filter). The other parts: engine-sensors.ts (oxygen,
// coolant-temperature, crank and cam sensors), engine-fuel-delivery.ts (injectors, pump, filter,
// evaporative system), engine-diesel-turbo.ts (glow plugs, EGR, turbocharger).
import {
  bearsOn,
  COMBUSTION,
  componentNode,
  failureMode,
  producesSymptoms,
  SAY,
  SPARK_IGNITION,
  systemNode,
  gradedOn,
} from "./build";
import type { KnowledgeBaseSeed } from "./types";

const fm = (parent: string, f: Parameters<typeof failureMode>[2]) =>
  failureMode("engine_fuel_emissions", parent, f);
const sym = { system: "engine_fuel_emissions" } as const;

export const engineFuelEmissions: KnowledgeBaseSeed = {
  symptoms: [
    {
      ...sym,
      key: "misfire_cold",
      name: "Misfire / rough idle when cold",
      kind: "performance",
      synonyms: [
        "rough idle",
        "lumpy idle",
        "shaking at idle",
        "missing when cold",
        "engine shakes on start-up",
        "stutters until warm",
        "hunting idle",
      ],
      conditions: ["cold start", "at idle"],
      leak: 0.04,
    },
    {
      ...sym,
      key: "misfire_load",
      name: "Misfire or hesitation under load",
      kind: "performance",
      synonyms: [
        "stutters when accelerating",
        "jerks",
        "jerking when I accelerate",
        "hesitates",
        "flat spot",
        "misses under load",
        "kangaroos uphill",
        "flashing engine light",
      ],
      conditions: ["accelerating", "under load", "uphill"],
      leak: 0.03,
    },
    {
      ...sym,
      key: "check_engine_light",
      name: "Engine management lamp (MIL) on",
      kind: "warning_lamp",
      synonyms: [
        "engine light",
        "engine management light",
        "check engine light",
        "engine warning light",
        "orange engine symbol",
        "malfunction indicator",
        "mil on",
        "emissions light",
        "fault light on",
      ],
      conditions: ["after start-up", "while driving"],
      leak: 0.03,
    },
    {
      ...sym,
      key: "high_fuel_consumption",
      name: "High fuel consumption",
      kind: "consumption",
      synonyms: [
        "drinks fuel",
        "poor economy",
        "high consumption",
        "mpg dropped",
        "uses more petrol",
        "uses more diesel",
        "thirsty",
        "fuel economy worse",
      ],
      conditions: ["over several tanks"],
      leak: 0.08,
    }, // short trips, winter fuel and driving style explain much of it
    {
      ...sym,
      key: "loss_of_power",
      name: "Loss of power or limp mode",
      kind: "performance",
      synonyms: [
        "no power",
        "sluggish",
        "limp mode",
        "won't rev past",
        "gutless",
        "feels flat",
        "reduced power",
      ],
      conditions: ["accelerating", "under load", "at speed"],
      leak: 0.04,
    },
    {
      ...sym,
      key: "idle_hunting",
      name: "Idle speed hunts up and down or sits too high",
      kind: "performance",
      synonyms: [
        "idle goes up and down",
        "revs hunting when stopped",
        "high idle",
        "revs surge at the lights",
        "idle revs fluctuate",
        "revs won't drop",
      ],
      conditions: ["at idle", "warm engine"],
      leak: 0.03,
    },
    {
      ...sym,
      key: "stalls_idle",
      name: "Stalls at idle or when coming to a stop",
      kind: "performance",
      synonyms: [
        "stalls",
        "stalling",
        "cuts out at junctions",
        "dies when I stop",
        "engine cuts out at idle",
        "conks out at the lights",
      ],
      conditions: ["at idle", "slowing down"],
      leak: 0.03,
    },
  ],

  causes: [
    systemNode(
      "engine_fuel_emissions",
      "Engine fuelling and emissions",
      "Ignition, air and fuel metering, engine management sensors, diesel glow and EGR, turbocharging and the evaporative system.",
    ),
    componentNode(
      "engine_fuel_emissions",
      "engine_ignition",
      "Ignition",
      "Spark plugs, ignition coils and their boots or leads on spark-ignition engines.",
    ),
    componentNode(
      "engine_fuel_emissions",
      "engine_air_fuel",
      "Air intake and metering",
      "Intake ducting and hoses, air filter, air-flow and manifold-pressure sensing, throttle and pedal sensors.",
    ),
    fm("engine_ignition", {
      key: "spark_plugs_worn",
      name: "Spark plugs worn or fouled",
      baseRate: 4,
      repairMinutes: 45,
      partsCost: 40,
      priority: "soon",
      description: "Electrodes worn or sooted: the spark is weak, worst on a cold engine and under load.",
      ownerDescription: "The spark plugs, which light the fuel in the engine, have worn out.",
      ifLeft:
        "The engine runs less smoothly, uses more fuel and misfires can damage the catalytic converter.",
      applicability: { fuel: SPARK_IGNITION, minKm: 60000, youngFactor: 0.2 },
    }),
    fm("engine_ignition", {
      key: "ignition_coil_failed",
      name: "Ignition coil failing (misfire on one cylinder)",
      baseRate: 4,
      repairMinutes: 30,
      partsCost: 60,
      priority: "soon",
      description:
        "One coil breaks down under load or when damp: a misfire on one cylinder (P0301 and the like), often with the engine lamp flashing. Unburnt fuel can damage the catalyst.",
      ownerDescription:
        "One of the parts that makes the spark for the engine has failed, so one cylinder is not firing properly.",
      ifLeft:
        "The engine shakes and loses power, and unburnt fuel can overheat and ruin the catalytic converter, a much dearer repair.",
      applicability: { fuel: SPARK_IGNITION },
    }),
    fm("engine_ignition", {
      key: "ignition_lead_tracking",
      name: "Coil boot or plug lead cracked and tracking",
      baseRate: 1.5,
      repairMinutes: 30,
      partsCost: 40,
      priority: "soon",
      description:
        "The rubber boot or lead has cracked or been contaminated with oil, so the spark jumps to earth: misfire on damp mornings and under load.",
      ownerDescription:
        "The rubber cover that carries the spark to a plug has cracked, so the spark escapes.",
      ifLeft:
        "The misfire gets more frequent, especially in damp weather, and can damage the coil and catalytic converter.",
      applicability: { fuel: SPARK_IGNITION, minAgeYears: 8 },
    }),
    fm("engine_air_fuel", {
      key: "intake_air_leak",
      name: "Unmetered air leak into the intake",
      baseRate: 3,
      repairMinutes: 60,
      partsCost: 30,
      priority: "soon",
      description:
        "A split hose, perished gasket or breather leak lets in air the sensor did not measure: lean running (P0171), rough idle, high positive fuel trims.",
      ownerDescription:
        "Air is getting into the engine through a split pipe or worn seal, so the engine's fuel mixture is wrong.",
      ifLeft:
        "The engine runs roughly, especially at idle, the warning lamp stays on and the car may fail its emissions test.",
      applicability: { fuel: SPARK_IGNITION, minAgeYears: 6 },
    }),
    fm("engine_air_fuel", {
      key: "maf_sensor_fault",
      name: "Air-flow sensor contaminated or reading wrong",
      baseRate: 2,
      repairMinutes: 30,
      partsCost: 120,
      priority: "soon",
      description:
        "Oil or dirt on the sensing element makes it misread the air: flat spots, loss of power, wrong mixture and poor economy.",
      ownerDescription: "The sensor that measures the air going into the engine is dirty or faulty.",
      ifLeft:
        "The engine keeps running with the wrong mixture: poor power, higher fuel use and possible limp mode.",
      applicability: { fuel: COMBUSTION },
    }),
    fm("engine_air_fuel", {
      key: "throttle_body_dirty",
      name: "Throttle body coked up or idle control out of learn",
      baseRate: 2.5,
      repairMinutes: 45,
      partsCost: 10,
      priority: "watch",
      description:
        "Carbon round the throttle plate or a lost idle adaptation: hunting or high idle, stalling when coming to a stop, idle codes (P0505 / P0506 / P0507).",
      ownerDescription:
        "The valve that controls the air at idle has got dirty, so the engine cannot hold a steady tickover.",
      ifLeft:
        "Idling gets worse and the engine may stall at junctions, which is inconvenient and can be unsafe in traffic.",
      applicability: { fuel: SPARK_IGNITION, minKm: 60000, youngFactor: 0.3 },
    }),
    fm("engine_air_fuel", {
      key: "pedal_throttle_sensor_fault",
      name: "Throttle or accelerator-pedal position sensor fault",
      baseRate: 1,
      repairMinutes: 45,
      partsCost: 120,
      priority: "soon",
      description:
        "A worn track or wiring fault in the pedal or throttle position sensor: the two signals disagree, the engine computer limits power (limp mode) and sets a throttle code (P0121).",
      ownerDescription:
        "A sensor that reads how far the accelerator is pressed, or how far the engine's air valve is open, has a fault.",
      ifLeft:
        "The car can drop into a low-power mode at any time, which is dangerous when overtaking or joining a fast road.",
      applicability: { fuel: COMBUSTION },
    }),
    fm("engine_air_fuel", {
      key: "map_sensor_fault",
      name: "Manifold or boost pressure sensor fault",
      baseRate: 1,
      repairMinutes: 30,
      partsCost: 70,
      priority: "soon",
      description:
        "The pressure sensor or its hose reads wrong (P0106): wrong fuelling, lack of power, black smoke on diesels, poor economy.",
      ownerDescription:
        "A sensor that measures the pressure in the engine's air intake is giving a wrong reading.",
      ifLeft:
        "The engine keeps getting the wrong amount of fuel: less power, more fuel used and, on diesels, smoke.",
      applicability: { fuel: COMBUSTION },
    }),
    fm("engine_air_fuel", {
      key: "air_filter_blocked",
      name: "Air filter blocked",
      baseRate: 2,
      repairMinutes: 15,
      partsCost: 20,
      priority: "watch",
      description:
        "An overdue or wet filter restricts air: loss of power at high load, black smoke on diesels; a collapsed filter can let dirt in.",
      ownerDescription: "The engine's air filter is clogged and needs replacing.",
      ifLeft: "Power and economy fall a little, and a filter that breaks up can let dirt into the engine.",
      applicability: { fuel: COMBUSTION, minKm: 30000, youngFactor: 0.3 },
    }),
  ],

  checks: [
    {
      key: "engine_fault_memory",
      name: "Read engine fault memory and freeze-frame data with a scan tool",
      skill: "technician",
      minutes: 10,
      consumablesCost: 0,
      access: ["scan_tool"],
      cautions: [],
      instructions: [
        "Connect the scan tool, ignition on, and read stored and pending engine faults with their freeze-frame data (speed, load, temperature, trims).",
        "Note each code in its standard form (for example P0171, P0300) before anything is cleared.",
        "Check readiness monitors; a recently cleared memory hides faults.",
      ],
      tools: ["scan tool"],
      result: {
        kind: "pass_fail",
        failMeans:
          "Faults are stored: they point to the circuit or system to test next; a code alone is not a diagnosis.",
      },
      falseAlarm: 0.1,
    },
    {
      key: "long_term_fuel_trim",
      name: "Read long-term fuel trim at warm idle and at 2500 rpm",
      skill: "technician",
      minutes: 15,
      consumablesCost: 0,
      access: ["scan_tool"],
      cautions: ["exhaust_fumes"],
      instructions: [
        SAY.FUMES,
        "Warm the engine fully so it runs in closed loop (petrol engines). Read long-term fuel trim for each bank at idle, then at a steady 2500 rpm.",
        "Record the reading furthest from zero. A lean trim that falls at 2500 rpm points to a vacuum leak; one that rises points to fuel supply or air-flow sensing.",
        "Trim limits are maker-specific: use the maker's figure where it gives one.",
      ],
      tools: ["scan tool", "exhaust extraction"],
      result: {
        kind: "measurement",
        quantity: "long-term fuel trim (percent)",
        unit: "",
        rule: "value >= -10 and value <= 10", // common practice, limits maker-specific (SOURCES.md): beyond about ±10% is worth investigating; about ±25% commonly sets P0171 / P0172
        failMeans:
          "The engine computer is correcting hard for too much air (positive) or too much fuel (negative): find the leak, sensor or injector behind it.",
      },
      falseAlarm: 0.08,
    },
    {
      key: "misfire_counters_coil_swap",
      name: "Read misfire counters and swap the coil to see if the misfire follows",
      skill: "technician",
      minutes: 20,
      consumablesCost: 0,
      access: ["scan_tool", "bonnet_open"],
      cautions: ["hot_parts", "exhaust_fumes", "rotating_parts"],
      instructions: [
        SAY.RUNNING +
          " Switch the engine off before unplugging any coil: ignition voltage can give a painful shock, and the engine is hot.",
        "Read the per-cylinder misfire counters (or codes such as P0300 / P0301) at idle and on a short drive.",
        "Swap the suspect coil with its neighbour, clear the counters and repeat: if the misfire moves cylinder, the coil is at fault.",
      ],
      tools: ["scan tool", "exhaust extraction"],
      result: {
        kind: "pass_fail",
        failMeans:
          "The misfire follows the coil: replace it. If it stays on the cylinder, look at the plug, the boot, compression and fuel delivery.",
      },
      falseAlarm: 0.06,
    },
    {
      key: "spark_plug_inspect",
      name: "Remove and inspect the spark plugs",
      skill: "technician",
      minutes: 40,
      consumablesCost: 0,
      access: ["bonnet_open", "cold_engine"],
      cautions: ["hot_parts"],
      instructions: [
        "Follow the vehicle maker's procedure; work on a cold engine so the threads in the head are not damaged and you are not burnt.",
        "Blow debris out of the plug wells, remove each plug and keep them in cylinder order; note oil standing in any well.",
        "Compare gap, electrode wear and deposits: wet with fuel, oily, sooty or white. Refit or renew to the maker's torque.",
      ],
      tools: ["spark plug socket", "feeler gauge", "torque wrench", "air line"],
      result: {
        kind: "pass_fail",
        failMeans:
          "Plugs are worn or fouled; the deposit tells you whether fuel, oil or the plug itself is to blame.",
      },
      falseAlarm: 0.08,
    },
    {
      key: "ignition_boot_inspect",
      name: "Inspect coil boots and plug leads for cracks and tracking",
      skill: "technician",
      minutes: 20,
      consumablesCost: 0,
      access: ["bonnet_open"],
      cautions: ["hot_parts", "exhaust_fumes", "rotating_parts"],
      instructions: [
        SAY.RUNNING +
          " Never touch a coil, boot or lead with the engine running: the spark voltage can give a painful shock.",
        "Engine off and cooled: remove each coil or lead and look for cracks, burn tracks and oil on the boot.",
        "With the engine idling in a dim bay, mist water lightly over the coils and leads from a distance and watch for sparks or a change in idle.",
      ],
      tools: ["inspection lamp", "water mister", "exhaust extraction"],
      result: {
        kind: "pass_fail",
        failMeans:
          "A boot or lead is tracking: replace it, and find and fix any oil getting into the plug wells.",
      },
      falseAlarm: 0.05,
    },
    {
      key: "intake_smoke_test",
      name: "Smoke-test the intake for unmetered air leaks",
      skill: "senior",
      minutes: 30,
      consumablesCost: 2,
      access: ["bonnet_open"],
      cautions: ["hot_parts"],
      instructions: [
        "Follow the vehicle maker's procedure and the smoke machine's instructions; engine off and cooled, the manifold and turbo can be hot.",
        "Seal the intake after the air-flow sensor, connect the smoke machine to a vacuum port and fill the intake (and the boost pipes on turbo engines) with smoke at low pressure.",
        "Watch hoses, gaskets, the breather system and brake servo hose with a bright lamp for escaping smoke.",
      ],
      tools: ["smoke machine", "intake blanking plugs", "bright lamp"],
      result: {
        kind: "pass_fail",
        failMeans:
          "Smoke escapes at a hose or gasket: that is the air leak; repair it and recheck fuel trims.",
      },
      falseAlarm: 0.05,
    },
    {
      key: "maf_live_reading",
      name: "Check air-flow sensor readings at idle and on a wide-open-throttle pull",
      skill: "technician",
      minutes: 20,
      consumablesCost: 0,
      access: ["scan_tool", "road_test"],
      cautions: ["exhaust_fumes"],
      instructions: [
        SAY.FUMES,
        "Read air flow at warm idle and compare with the maker's figure or a known-good car of the same engine.",
        "On a safe road, record a full-throttle pull in a middle gear: air flow should rise smoothly without flat spots.",
      ],
      tools: ["scan tool", "exhaust extraction"],
      result: {
        kind: "pass_fail",
        failMeans:
          "Air flow reads low, erratic or flat: clean or replace the sensor after ruling out intake leaks and a blocked filter.",
      },
      falseAlarm: 0.08,
    },
    {
      key: "throttle_body_inspect",
      name: "Inspect and clean the throttle body, then relearn the idle",
      skill: "technician",
      minutes: 30,
      consumablesCost: 5,
      access: ["bonnet_open", "scan_tool"],
      cautions: ["exhaust_fumes", "rotating_parts"],
      instructions: [
        SAY.RUNNING +
          " Ignition off and key away before fingers go near the throttle plate: an electronic throttle can snap shut.",
        "Remove the intake hose and look for a ring of carbon round the plate and bore; clean with a throttle cleaner that is safe for the coating.",
        "Refit, then run the maker's idle or throttle relearn with the scan tool and watch the idle settle.",
      ],
      tools: ["throttle body cleaner", "lint-free cloth", "scan tool", "exhaust extraction"],
      result: {
        kind: "pass_fail",
        failMeans:
          "The throttle was coked up or out of learn and the idle is now steady: that was the fault.",
      },
      falseAlarm: 0.08,
    },
    {
      key: "pedal_sensor_sweep",
      name: "Sweep the pedal and throttle position signals on the scan tool",
      skill: "technician",
      minutes: 15,
      consumablesCost: 0,
      access: ["scan_tool"],
      cautions: [],
      instructions: [
        "Ignition on, engine off: graph both accelerator-pedal signals and both throttle-position signals while pressing the pedal slowly to the floor and back.",
        "The paired signals should move smoothly together without drop-outs; wiggle the connectors while watching for glitches.",
      ],
      tools: ["scan tool"],
      result: {
        kind: "pass_fail",
        failMeans:
          "A position signal drops out or the pair disagree: repair the wiring or replace the pedal or throttle unit.",
      },
      falseAlarm: 0.05,
    },
    {
      key: "map_sensor_compare",
      name: "Compare the manifold pressure reading with the air pressure, then at idle",
      skill: "technician",
      minutes: 15,
      consumablesCost: 0,
      access: ["scan_tool"],
      cautions: ["exhaust_fumes"],
      instructions: [
        SAY.FUMES,
        "Ignition on, engine off: the manifold (or boost) pressure should read the same as the barometric pressure on the scan tool.",
        "Start the engine and read it at idle and with a quick blip; check the sensor's hose for splits and oil.",
      ],
      tools: ["scan tool", "exhaust extraction"],
      result: {
        kind: "pass_fail",
        failMeans:
          "The pressure sensor reads wrong or sluggishly: clear its hose, check the wiring, then replace the sensor.",
      },
      falseAlarm: 0.05,
    },
    {
      key: "air_filter_inspect",
      name: "Inspect the air filter and intake ducting",
      skill: "apprentice",
      minutes: 10,
      consumablesCost: 0,
      access: ["bonnet_open"],
      cautions: [],
      instructions: [
        "Engine off: open the air box, lift out the filter and hold it up to a lamp; look for dirt build-up, water, oil and a collapsed element.",
        "Check the ducting and clips between the air box and the engine for splits and a loose air-flow sensor joint.",
      ],
      tools: ["inspection lamp", "screwdriver"],
      result: {
        kind: "pass_fail",
        failMeans: "The filter is blocked or damaged, or a duct is split: replace the filter, fix the duct.",
      },
      falseAlarm: 0.05,
    },
  ],

  symptomLinks: [
    ...producesSymptoms("spark_plugs_worn", {
      misfire_cold: 0.5,
      misfire_load: 0.6,
      check_engine_light: 0.4,
      high_fuel_consumption: 0.2,
      hard_cold_start: 0.3,
    }),
    ...producesSymptoms("ignition_coil_failed", {
      misfire_load: 0.8,
      misfire_cold: 0.6,
      check_engine_light: 0.8,
      loss_of_power: 0.3,
    }),
    ...producesSymptoms("ignition_lead_tracking", {
      misfire_cold: 0.5,
      misfire_load: 0.5,
      check_engine_light: 0.5,
    }),
    ...producesSymptoms("intake_air_leak", {
      misfire_cold: 0.45,
      check_engine_light: 0.6,
      high_fuel_consumption: 0.15,
      hard_cold_start: 0.15,
      idle_hunting: 0.4,
      stalls_idle: 0.2,
    }),
    ...producesSymptoms("maf_sensor_fault", {
      loss_of_power: 0.5,
      check_engine_light: 0.5,
      high_fuel_consumption: 0.35,
      misfire_load: 0.25,
      black_smoke: 0.2,
      stalls_idle: 0.2,
    }),
    ...producesSymptoms("throttle_body_dirty", {
      idle_hunting: 0.6,
      stalls_idle: 0.6,
      check_engine_light: 0.3,
    }),
    ...producesSymptoms("pedal_throttle_sensor_fault", {
      loss_of_power: 0.7,
      check_engine_light: 0.7,
      idle_hunting: 0.2,
    }),
    ...producesSymptoms("map_sensor_fault", {
      check_engine_light: 0.6,
      loss_of_power: 0.4,
      black_smoke: 0.2,
      high_fuel_consumption: 0.2,
    }),
    ...producesSymptoms("air_filter_blocked", {
      loss_of_power: 0.4,
      high_fuel_consumption: 0.2,
      black_smoke: 0.3,
      check_engine_light: 0.1,
    }),
  ],

  checkLinks: [
    ...bearsOn("engine_fault_memory", { engine_fuel_emissions: 0.5 }),
    ...gradedOn("long_term_fuel_trim", {
      intake_air_leak: { well_within: 0.05, near: 0.1, beyond: 0.4, far_beyond: 0.45 },
    }),
    ...bearsOn("long_term_fuel_trim", {
      maf_sensor_fault: 0.7,
      lambda_sensor_slow: 0.5,
      injector_leaking: 0.55,
      manifold_leak: 0.3,
      map_sensor_fault: 0.4,
      fuel_pump_weak: 0.5,
      fuel_filter_blocked: 0.3,
      injector_clogged: 0.4,
      breather_fault: 0.4,
    }),
    ...bearsOn("misfire_counters_coil_swap", {
      ignition_coil_failed: 0.85,
      spark_plugs_worn: 0.4,
      injector_leaking: 0.2,
      ignition_lead_tracking: 0.5,
      injector_clogged: 0.3,
      injector_circuit_fault: 0.3,
    }),
    ...bearsOn("spark_plug_inspect", {
      spark_plugs_worn: 0.9,
      valve_stem_seals_worn: 0.3,
      piston_rings_worn: 0.35,
      injector_leaking: 0.3,
      ignition_coil_failed: 0.2,
      cam_cover_gasket_leak: 0.3,
    }),
    ...bearsOn("ignition_boot_inspect", { ignition_lead_tracking: 0.8, ignition_coil_failed: 0.3 }),
    ...bearsOn("intake_smoke_test", {
      intake_air_leak: 0.9,
      breather_fault: 0.5,
      brake_servo_vacuum: 0.5,
      turbo_hose_split: 0.5,
    }),
    ...bearsOn("maf_live_reading", { maf_sensor_fault: 0.75, air_filter_blocked: 0.3 }),
    ...bearsOn("throttle_body_inspect", { throttle_body_dirty: 0.85 }),
    ...bearsOn("pedal_sensor_sweep", { pedal_throttle_sensor_fault: 0.85 }),
    ...bearsOn("map_sensor_compare", { map_sensor_fault: 0.8, intake_air_leak: 0.3 }),
    ...bearsOn("air_filter_inspect", { air_filter_blocked: 0.9, maf_sensor_fault: 0.2 }),
  ],
};
