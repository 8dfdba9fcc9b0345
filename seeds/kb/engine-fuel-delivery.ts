// Engine fuelling and emissions, part 3: fuel delivery (injectors, pump, filter, lines) and the
// evaporative emission system (purge valve, filler cap, canister and hoses).
import {
  bearsOn,
  COMBUSTION,
  componentNode,
  DIESEL_ONLY,
  failureMode,
  producesSymptoms,
  SAY,
  SPARK_IGNITION,
} from "./build";
import type { KnowledgeBaseSeed } from "./types";

const fm = (parent: string, f: Parameters<typeof failureMode>[2]) =>
  failureMode("engine_fuel_emissions", parent, f);
const sym = { system: "engine_fuel_emissions" } as const;

export const engineFuelDelivery: KnowledgeBaseSeed = {
  symptoms: [
    {
      ...sym,
      key: "fuel_smell",
      name: "Raw fuel smell",
      kind: "smell",
      synonyms: [
        "smell of petrol",
        "smell of diesel",
        "fuel smell in the car",
        "fuel dripping",
        "strong fuel smell after parking",
      ],
      conditions: ["parked", "after driving", "after filling up"],
      leak: 0.03,
    },
    {
      ...sym,
      key: "cranks_no_start",
      name: "Turns over normally but will not fire",
      kind: "performance",
      synonyms: [
        "cranks but won't fire",
        "turns over but doesn't start",
        "engine spins but no start",
        "cranks no start",
        "starter works but engine doesn't catch",
      ],
      conditions: ["starting"],
      leak: 0.03,
    }, // an empty tank is the usual leak
    {
      ...sym,
      key: "hard_hot_start",
      name: "Hard to start when hot",
      kind: "performance",
      synonyms: [
        "long crank when warm",
        "slow to restart after a stop",
        "struggles to restart hot",
        "hot start problem",
        "cranks for ages at the petrol station",
      ],
      conditions: ["warm engine", "restarting"],
      leak: 0.03,
    },
    {
      ...sym,
      key: "rough_after_refuel",
      name: "Runs lumpy or is hard to start just after filling up",
      kind: "performance",
      synonyms: [
        "hard to start after filling up",
        "stumbles after refuelling",
        "lumpy after filling the tank",
        "cuts out after filling up",
      ],
      conditions: ["after filling up"],
      leak: 0.02,
    },
  ],

  causes: [
    componentNode(
      "engine_fuel_emissions",
      "engine_fuel_delivery",
      "Fuel delivery",
      "Fuel pump, filter, lines and rail, and the injectors and their wiring.",
    ),
    componentNode(
      "engine_fuel_emissions",
      "engine_evap",
      "Evaporative emission system",
      "The charcoal canister, purge valve, hoses and filler cap that keep fuel vapour in (spark-ignition engines).",
    ),
    fm("engine_fuel_delivery", {
      key: "injector_leaking",
      name: "Fuel injector leaking or dribbling",
      baseRate: 1.5,
      repairMinutes: 90,
      partsCost: 150,
      priority: "soon",
      description:
        "An injector that does not seal floods its cylinder: rich running (P0172), rough cold start, fuel smell, high consumption.",
      ownerDescription:
        "One of the parts that sprays fuel into the engine is leaking, so the engine gets too much fuel.",
      ifLeft:
        "The engine runs roughly, uses more fuel and the extra fuel can damage the catalytic converter or thin the engine oil.",
      applicability: { fuel: COMBUSTION, minKm: 80000, youngFactor: 0.3 },
    }),
    fm("engine_fuel_delivery", {
      key: "injector_clogged",
      name: "Fuel injector partly blocked (lean cylinder)",
      baseRate: 1.5,
      repairMinutes: 90,
      partsCost: 150,
      priority: "soon",
      description:
        "Deposits restrict an injector's spray: that cylinder runs lean and misfires under load; on diesels, rough running and smoke.",
      ownerDescription:
        "One of the fuel sprayers in the engine is partly blocked, so that cylinder gets too little fuel.",
      ifLeft: "The misfire and hesitation get worse and a lean cylinder can run hot and be damaged.",
      applicability: { fuel: COMBUSTION, minKm: 100000, youngFactor: 0.3 },
    }),
    fm("engine_fuel_delivery", {
      key: "injector_circuit_fault",
      name: "Injector coil or wiring open circuit",
      baseRate: 0.8,
      repairMinutes: 60,
      partsCost: 100,
      priority: "soon",
      description:
        "An injector's coil or its wiring has failed, so it does not fire at all (P0201 and the like): a dead cylinder and a steady misfire.",
      ownerDescription:
        "The electrical side of one of the fuel sprayers has failed, so one cylinder gets no fuel.",
      ifLeft:
        "The engine runs on one cylinder less, shakes, and unburnt air and fuel upset the exhaust system.",
      applicability: { fuel: COMBUSTION },
    }),
    fm("engine_fuel_delivery", {
      key: "fuel_leak",
      name: "Fuel leak at a pipe, hose or seal",
      baseRate: 0.8,
      repairMinutes: 60,
      partsCost: 40,
      priority: "stop",
      description: "Fuel escaping from a line, hose, rail seal or the tank: fire risk. Not safe to drive.",
      ownerDescription: "Fuel is leaking from a pipe, hose or seal.",
      ifLeft: "Leaking fuel can catch fire. The car must not be driven until it is repaired.",
      applicability: { fuel: COMBUSTION, minAgeYears: 8 },
    }),
    fm("engine_fuel_delivery", {
      key: "fuel_pump_weak",
      name: "Fuel pump weak or failing",
      baseRate: 1.5,
      repairMinutes: 120,
      partsCost: 200,
      priority: "soon",
      description:
        "The in-tank pump no longer holds pressure under load (or its relay or feed is failing): hesitation and loss of power at high load, long cranking, then a no-start (P0087 on rail-pressure systems).",
      ownerDescription: "The pump that sends fuel from the tank to the engine is wearing out.",
      ifLeft:
        "The car loses power under load and, in the end, will stop and not restart, often without much warning.",
      applicability: { fuel: COMBUSTION, minKm: 120000, youngFactor: 0.3 },
    }),
    fm("engine_fuel_delivery", {
      key: "fuel_filter_blocked",
      name: "Fuel filter blocked or water in the diesel filter",
      baseRate: 1.5,
      repairMinutes: 45,
      partsCost: 35,
      priority: "soon",
      description:
        "An overdue filter restricts flow, or water has collected in a diesel filter: loss of power at high load, hard starting, stalling; waxing in cold weather on diesels.",
      ownerDescription: "The fuel filter is clogged (or has water in it) and is starving the engine of fuel.",
      ifLeft:
        "Power drops further and the engine can stop; water in diesel fuel can damage the injection pump and injectors.",
      applicability: { fuel: COMBUSTION, minKm: 40000, youngFactor: 0.3 },
    }),
    fm("engine_fuel_delivery", {
      key: "diesel_injector_leakoff",
      name: "Diesel injector back-leak excessive",
      baseRate: 1,
      repairMinutes: 120,
      partsCost: 300,
      priority: "soon",
      description:
        "Worn injector valves spill too much fuel back to the tank, so rail pressure builds slowly: long cranking hot or cold, rough running and smoke. Diesel only.",
      ownerDescription:
        "Some of the diesel injectors are leaking fuel back inside, so the engine struggles to build up fuel pressure.",
      ifLeft: "Starting gets harder until the car will not start, and running gets rougher.",
      applicability: { fuel: DIESEL_ONLY, minKm: 150000, youngFactor: 0.2 },
    }),
    fm("engine_evap", {
      key: "evap_purge_valve_stuck",
      name: "Evaporative purge valve stuck open",
      baseRate: 1.5,
      repairMinutes: 30,
      partsCost: 50,
      priority: "watch",
      description:
        "The valve that lets fuel vapour from the canister into the intake is stuck open: rich stumble and hard starting after refuelling, purge-flow codes (P0441).",
      ownerDescription:
        "A valve that handles fuel vapour from the tank is stuck open, so the engine gets a gulp of vapour after you fill up.",
      ifLeft: "It keeps stumbling and starting badly after refuelling, and the warning lamp stays on.",
      applicability: { fuel: SPARK_IGNITION, minAgeYears: 6 },
    }),
    fm("engine_evap", {
      key: "fuel_cap_seal_faulty",
      name: "Fuel filler cap seal worn or cap not clicked shut",
      baseRate: 1.5,
      repairMinutes: 5,
      partsCost: 20,
      priority: "watch",
      description:
        "A worn cap seal or a cap left loose lets the tank vent: a large evaporative leak code (P0455) and sometimes a fuel smell. Nothing else is wrong.",
      ownerDescription:
        "The fuel filler cap is not sealing, often because it was not clicked shut or its rubber seal has worn.",
      ifLeft: "Fuel vapour escapes and the warning lamp stays on, which can hide other faults.",
      applicability: { fuel: SPARK_IGNITION },
    }),
    fm("engine_evap", {
      key: "evap_leak_hose_canister",
      name: "Evaporative hose, canister or vent valve leaking",
      baseRate: 1,
      repairMinutes: 60,
      partsCost: 80,
      priority: "watch",
      description:
        "A cracked vapour hose, a damaged canister or a leaking vent valve: small or large leak codes (P0442 / P0455 / P0456) and a fuel smell near the tank.",
      ownerDescription: "A pipe or part that stores fuel vapour from the tank has a leak.",
      ifLeft: "Fuel vapour escapes (a smell and pollution) and the warning lamp stays on.",
      applicability: { fuel: SPARK_IGNITION, minAgeYears: 8 },
    }),
  ],

  checks: [
    {
      key: "fuel_leak_inspection",
      name: "Look and sniff for fuel leaks at the rail, injectors, lines and tank",
      skill: "technician",
      minutes: 20,
      consumablesCost: 0,
      access: ["bonnet_open", "ramp"],
      cautions: ["fuel", "lifting", "hot_parts"],
      instructions: [
        SAY.FUEL,
        SAY.LIFT,
        "With the ignition on (pump primed) and engine off, inspect the rail, injector seals, filter, supply and return lines under the bonnet; the engine may still be hot.",
        "On the ramp, follow the fuel lines to the tank, and check the filler neck and tank seams for wetness or fresh staining.",
      ],
      tools: ["inspection lamp", "fire extinguisher"],
      result: {
        kind: "pass_fail",
        failMeans: "Fuel is escaping: fire risk, the car must not be driven until repaired.",
      },
      falseAlarm: 0.04,
    },
    {
      key: "fuel_pressure_hold",
      name: "Fuel pressure hold test after switch-off",
      skill: "senior",
      minutes: 30,
      consumablesCost: 0,
      access: ["bonnet_open", "scan_tool"],
      cautions: ["fuel", "hot_parts", "exhaust_fumes", "rotating_parts"],
      instructions: [
        SAY.FUEL +
          " " +
          SAY.RUNNING +
          " Use only the low-pressure test port; on direct-injection engines never open the high-pressure side, read rail pressure on the scan tool.",
        "Fit the gauge, run the engine, switch off and watch pressure for the time the maker gives.",
        "Compare the drop with the maker's figure; a fast drop with no outside leak points to a leaking injector or check valve.",
      ],
      tools: ["fuel pressure gauge set", "scan tool", "fire extinguisher"],
      result: {
        kind: "pass_fail",
        failMeans:
          "Pressure falls faster than the maker allows: an injector, regulator or check valve is leaking.",
      },
      falseAlarm: 0.08,
    },
    {
      key: "fuel_pressure_running",
      name: "Measure fuel supply pressure with the engine running",
      skill: "senior",
      minutes: 30,
      consumablesCost: 0,
      access: ["bonnet_open", "scan_tool"],
      cautions: ["fuel", "hot_parts", "exhaust_fumes", "rotating_parts"],
      instructions: [
        SAY.FUEL +
          " " +
          SAY.RUNNING +
          " Low-pressure side only; on direct-injection and diesel engines compare actual with desired rail pressure on the scan tool instead of opening the high-pressure side.",
        "Fit the gauge to the test port, run at idle and then at raised revs, and note the lowest steady pressure; pinch nothing.",
        "Use the maker's figure for this engine's supply pressure where it differs from the generic value.",
      ],
      tools: ["fuel pressure gauge set", "scan tool", "fire extinguisher", "exhaust extraction"],
      result: {
        kind: "measurement",
        quantity: "pressure",
        unit: "bar",
        rule: "value >= 2.5 bar", // from memory: port-injection supply pressures are commonly about 2.5–4 bar; maker-specific — use the maker's figure
        failMeans:
          "The supply pressure is low: check the filter and the pump's feed and earth, then the pump.",
      },
      falseAlarm: 0.05,
    },
    {
      key: "fuel_pump_supply_check",
      name: "Listen for the pump priming and check its fuse, relay and feed",
      skill: "technician",
      minutes: 20,
      consumablesCost: 0,
      access: [],
      cautions: ["fuel"],
      instructions: [
        SAY.FUEL + " Keep the tank access cover shut unless the maker's procedure needs it open.",
        "Switch the ignition on and listen at the tank or filler for the fuel pump running for a couple of seconds.",
        "If it is silent, check the pump fuse and relay from the fuse chart, then the feed and earth at the pump plug while a helper switches on.",
      ],
      tools: ["multimeter", "fuse puller", "test lamp"],
      result: {
        kind: "pass_fail",
        failMeans:
          "The pump does not run, or its feed or earth is missing: repair the circuit or replace the pump.",
      },
      falseAlarm: 0.04,
    },
    {
      key: "injector_balance_test",
      name: "Compare the injectors' contribution or correction values",
      skill: "technician",
      minutes: 20,
      consumablesCost: 0,
      access: ["scan_tool"],
      cautions: ["exhaust_fumes", "fuel"],
      instructions: [
        SAY.FUMES + " " + SAY.FUEL,
        "At warm idle, read each injector's correction quantity (diesels) or run the cylinder contribution test the scan tool offers.",
        "One injector far from the others, or a cylinder that makes no difference when cut, is the suspect; compare with the maker's limits.",
      ],
      tools: ["scan tool", "exhaust extraction"],
      result: {
        kind: "pass_fail",
        failMeans: "One injector corrects or contributes far out of line: test or replace that injector.",
      },
      falseAlarm: 0.06,
    },
    {
      key: "injector_circuit_test",
      name: "Measure the injector coil and check its firing pulse",
      skill: "technician",
      minutes: 20,
      consumablesCost: 0,
      access: ["bonnet_open"],
      cautions: ["fuel", "hot_parts"],
      instructions: [
        SAY.FUEL + " The engine may be hot; do not disconnect any fuel line for this test.",
        "Unplug the injector and measure its coil resistance against the others (and the maker's figure); then fit a test light or scope to the plug and crank.",
        "An open coil, or no pulse at the plug while the others have one, is a fail.",
      ],
      tools: ["multimeter", "injector test light or oscilloscope"],
      result: {
        kind: "pass_fail",
        failMeans:
          "The injector coil is open or its wiring gives no pulse: repair the wiring or replace the injector.",
      },
      falseAlarm: 0.04,
    },
    {
      key: "diesel_leakoff_test",
      name: "Diesel injector back-leak test",
      skill: "senior",
      minutes: 30,
      consumablesCost: 0,
      access: ["bonnet_open"],
      cautions: ["fuel", "hot_parts", "exhaust_fumes", "rotating_parts"],
      instructions: [
        SAY.FUEL +
          " " +
          SAY.RUNNING +
          " Never put hands near a high-pressure injector pipe with the engine running: a fine jet of diesel can pierce skin.",
        "Fit the back-leak test bottles to the injector return ports, then crank or idle for the time the maker's procedure gives.",
        "Compare the amount in each bottle: one much higher than the others, or all beyond the maker's figure, is a fail.",
      ],
      tools: ["back-leak test kit", "exhaust extraction", "fire extinguisher"],
      result: {
        kind: "pass_fail",
        failMeans: "An injector spills too much fuel back: recondition or replace it.",
      },
      falseAlarm: 0.05,
    },
    {
      key: "fuel_filter_inspect",
      name: "Drain the fuel filter's water trap and check the filter's age",
      skill: "technician",
      minutes: 20,
      consumablesCost: 0,
      access: ["bonnet_open"],
      cautions: ["fuel"],
      instructions: [
        SAY.FUEL,
        "Check the service record for the fuel filter's last change against the maker's interval.",
        "On diesels, drain the water trap into a clear jar: water, wax or dirt is a fail. Prime the system as the maker describes afterwards.",
      ],
      tools: ["clear jar", "fuel-resistant gloves", "hand primer"],
      result: {
        kind: "pass_fail",
        failMeans:
          "The filter is overdue or full of water or wax: renew it and look for the source of the water.",
      },
      falseAlarm: 0.06,
    },
    {
      key: "evap_smoke_test",
      name: "Smoke-test the evaporative system",
      skill: "senior",
      minutes: 40,
      consumablesCost: 2,
      access: ["ramp", "scan_tool"],
      cautions: ["lifting", "fuel"],
      instructions: [
        SAY.LIFT +
          " " +
          SAY.FUEL +
          " Use a smoke machine made for evaporative testing (it uses an inert gas, not air, near fuel vapour).",
        "Close the vent valve with the scan tool, then fill the system through the service port or filler neck at the machine's low pressure.",
        "Follow the hoses, canister, vent valve and filler neck with a bright lamp for escaping smoke.",
      ],
      tools: ["evaporative smoke machine", "scan tool", "bright lamp"],
      result: {
        kind: "pass_fail",
        failMeans: "Smoke escapes at a hose, the canister, the vent valve or the filler: repair the leak.",
      },
      falseAlarm: 0.04,
    },
    {
      key: "purge_valve_test",
      name: "Check the purge valve seals when off and opens when commanded",
      skill: "technician",
      minutes: 20,
      consumablesCost: 0,
      access: ["bonnet_open", "scan_tool"],
      cautions: ["fuel"],
      instructions: [
        SAY.FUEL,
        "Engine off: pull the hose from the intake side of the purge valve and apply vacuum with a hand pump: a closed valve must hold it.",
        "Command the valve with the scan tool and listen for it clicking and opening.",
      ],
      tools: ["hand vacuum pump", "scan tool"],
      result: {
        kind: "pass_fail",
        failMeans: "The purge valve leaks when shut or does not open: replace it.",
      },
      falseAlarm: 0.04,
    },
    {
      key: "fuel_cap_inspect",
      name: "Inspect the filler cap seal and the filler neck",
      skill: "apprentice",
      minutes: 5,
      consumablesCost: 0,
      access: [],
      cautions: [],
      instructions: [
        "Open the filler cap, look at its rubber seal for cracks or flattening and the neck for dents and dirt.",
        "Refit the cap and listen for it to click; a cap that does not click or is not the right type is a fail.",
      ],
      tools: ["inspection lamp"],
      result: {
        kind: "pass_fail",
        failMeans: "The cap does not seal: fit a correct new cap and clear the code after a drive.",
      },
      falseAlarm: 0.04,
    },
  ],

  symptomLinks: [
    ...producesSymptoms("injector_leaking", {
      high_fuel_consumption: 0.45,
      misfire_cold: 0.4,
      hard_cold_start: 0.35,
      fuel_smell: 0.3,
      black_smoke: 0.3,
      check_engine_light: 0.3,
      hard_hot_start: 0.4,
    }),
    ...producesSymptoms("injector_clogged", {
      misfire_load: 0.5,
      misfire_cold: 0.4,
      check_engine_light: 0.6,
      loss_of_power: 0.3,
    }),
    ...producesSymptoms("injector_circuit_fault", {
      misfire_cold: 0.6,
      misfire_load: 0.6,
      check_engine_light: 0.85,
    }),
    ...producesSymptoms("fuel_leak", { fuel_smell: 0.9, high_fuel_consumption: 0.2, hard_cold_start: 0.1 }),
    ...producesSymptoms("fuel_pump_weak", {
      loss_of_power: 0.6,
      cranks_no_start: 0.4,
      hard_hot_start: 0.3,
      misfire_load: 0.3,
      check_engine_light: 0.3,
    }),
    ...producesSymptoms("fuel_filter_blocked", {
      loss_of_power: 0.6,
      hard_cold_start: 0.3,
      cranks_no_start: 0.2,
      stalls_idle: 0.2,
    }),
    ...producesSymptoms("diesel_injector_leakoff", {
      hard_hot_start: 0.5,
      hard_cold_start: 0.5,
      cranks_no_start: 0.3,
      white_smoke: 0.2,
    }),
    ...producesSymptoms("evap_purge_valve_stuck", {
      rough_after_refuel: 0.7,
      check_engine_light: 0.6,
      idle_hunting: 0.2,
      stalls_idle: 0.2,
    }),
    ...producesSymptoms("fuel_cap_seal_faulty", { check_engine_light: 0.6, fuel_smell: 0.3 }),
    ...producesSymptoms("evap_leak_hose_canister", {
      check_engine_light: 0.6,
      fuel_smell: 0.4,
      rough_after_refuel: 0.2,
    }),
  ],

  checkLinks: [
    ...bearsOn("fuel_leak_inspection", { fuel_leak: 0.9, injector_leaking: 0.3 }),
    ...bearsOn("fuel_pressure_hold", { injector_leaking: 0.75, fuel_leak: 0.5, fuel_pump_weak: 0.4 }),
    ...bearsOn("fuel_pressure_running", { fuel_pump_weak: 0.8, fuel_filter_blocked: 0.6 }),
    ...bearsOn("fuel_pump_supply_check", { fuel_pump_weak: 0.6 }),
    ...bearsOn("injector_balance_test", {
      injector_clogged: 0.75,
      injector_leaking: 0.5,
      injector_circuit_fault: 0.5,
      diesel_injector_leakoff: 0.4,
    }),
    ...bearsOn("injector_circuit_test", { injector_circuit_fault: 0.85 }),
    ...bearsOn("diesel_leakoff_test", { diesel_injector_leakoff: 0.85 }),
    ...bearsOn("fuel_filter_inspect", { fuel_filter_blocked: 0.8 }),
    ...bearsOn("evap_smoke_test", { evap_leak_hose_canister: 0.85, fuel_cap_seal_faulty: 0.6 }),
    ...bearsOn("purge_valve_test", { evap_purge_valve_stuck: 0.85 }),
    ...bearsOn("fuel_cap_inspect", { fuel_cap_seal_faulty: 0.8 }),
  ],
};
