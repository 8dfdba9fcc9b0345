// Engine fuelling and emissions, part 2: diesel glow and EGR, and engine mechanical wear that
// shows as smoke and oil use. The system node lives in engine-fuel-emissions.ts.
import { bearsOn, COMBUSTION, componentNode, DIESEL_ONLY, failureMode, producesSymptoms } from "./build";
import type { KnowledgeBaseSeed } from "./types";

const fm = (parent: string, f: Parameters<typeof failureMode>[2]) => failureMode("engine_fuel_emissions", parent, f);

export const engineDieselMechanical: KnowledgeBaseSeed = {
  symptoms: [
    { key: "blue_smoke_startup", name: "Blue smoke on start-up", system: "engine_fuel_emissions", kind: "visual",
      synonyms: ["blue smoke", "smokes in the morning", "oily smoke", "puff of smoke on start", "burning oil smell from the exhaust"],
      conditions: ["cold start", "after idling"], leak: 0.01 },
    { key: "white_smoke", name: "White smoke from the exhaust", system: "engine_fuel_emissions", kind: "visual",
      synonyms: ["white smoke", "steam from the exhaust", "clouds of white smoke", "smokes white on start-up"],
      conditions: ["cold start", "after warm-up"], leak: 0.06 }, // condensation steam on a cold morning is normal and clears
    { key: "black_smoke", name: "Black smoke under acceleration", system: "engine_fuel_emissions", kind: "visual",
      synonyms: ["black smoke", "sooty exhaust", "smokes when I put my foot down", "soot on the bumper"],
      conditions: ["accelerating", "under load"], leak: 0.03 },
    { key: "oil_use", name: "Uses oil between services", system: "engine_fuel_emissions", kind: "performance",
      synonyms: ["burns oil", "uses oil", "oil level keeps dropping", "topping up oil", "oil light came on"],
      conditions: ["over several weeks"], leak: 0.04 },
  ],

  causes: [
    componentNode("engine_fuel_emissions", "engine_diesel", "Diesel glow and exhaust-gas recirculation", "Glow plugs and their control, and the EGR valve and cooler on diesel engines."),
    componentNode("engine_fuel_emissions", "engine_mechanical", "Engine mechanical", "Valves, guides, seals, pistons and rings."),
    fm("engine_diesel", { key: "glow_plugs_failed", name: "Glow plugs or glow control failed", baseRate: 2.5, repairMinutes: 90, partsCost: 100, priority: "soon",
      description: "One or more glow plugs (or the unit that powers them) has failed: long cranking from cold, white smoke and a rough first minute.",
      applicability: { fuel: DIESEL_ONLY, minKm: 80000, youngFactor: 0.3 } }),
    fm("engine_diesel", { key: "egr_valve_sticking", name: "EGR valve sticking from carbon build-up", baseRate: 2.5, repairMinutes: 120, partsCost: 200, priority: "soon",
      description: "Soot has built up so the valve sticks open or shut: rough idle, black smoke, loss of power and limp mode.",
      applicability: { fuel: DIESEL_ONLY, minKm: 80000, youngFactor: 0.3 } }),
    fm("engine_mechanical", { key: "valve_stem_seals_worn", name: "Valve-stem seals or guides worn", baseRate: 1.5, repairMinutes: 360, partsCost: 80, priority: "watch",
      description: "Oil seeps down the valve stems while the engine stands and burns off as a puff of blue smoke on start-up.",
      applicability: { fuel: COMBUSTION, minKm: 150000, youngFactor: 0.2 } }),
    fm("engine_mechanical", { key: "piston_rings_worn", name: "Piston rings worn (oil burning, low compression)", baseRate: 0.8, repairMinutes: 900, partsCost: 600, priority: "soon",
      description: "Worn or stuck rings let oil into the cylinders and gas past: heavy oil use, blue smoke under load, loss of power and low compression.",
      applicability: { fuel: COMBUSTION, minKm: 200000, youngFactor: 0.1 } }),
  ],

  checks: [
    { key: "glow_plug_resistance", name: "Measure glow plug resistance", skill: "technician", minutes: 30, consumablesCost: 0,
      access: ["bonnet_open", "cold_engine"], cautions: ["hot_parts"],
      instructions: [
        "Follow the vehicle maker's procedure; glow plugs and their bus bar get very hot when powered — ignition off, engine cold.",
        "Disconnect the feed from each glow plug and measure from the plug terminal to engine earth with a low-ohm meter.",
        "Compare the plugs with each other and with the maker's figure for this plug; an open circuit reads as infinite.",
        "Read the glow-control fault memory with a scan tool as well.",
      ],
      tools: ["multimeter", "scan tool"],
      result: { kind: "measurement", quantity: "resistance", unit: "ohm",
        rule: "value <= 2 ohm", // from memory, common practice: healthy plugs read well under about 2 Ω cold; maker-specific — use the maker's figure
        failMeans: "A glow plug is open or high resistance: replace it (plugs can seize in the head — senior's judgement on removal)." },
      falseAlarm: 0.04 },
    { key: "egr_command_test", name: "Command the EGR valve with the scan tool and watch its position", skill: "technician", minutes: 30, consumablesCost: 0,
      access: ["scan_tool", "bonnet_open"], cautions: ["hot_parts", "exhaust_fumes"],
      instructions: [
        "Follow the vehicle maker's procedure; run the engine only with exhaust extraction, and let the EGR valve and pipes cool before touching them.",
        "With the scan tool, command the valve open and shut and compare commanded with actual position.",
        "If it lags or sticks, remove it and look for carbon on the valve and seat.",
      ],
      tools: ["scan tool", "exhaust extraction"],
      result: { kind: "pass_fail", failMeans: "The EGR valve does not follow the command: clean or replace the valve." },
      falseAlarm: 0.06 },
    { key: "compression_test", name: "Compression test, then leak-down on any low cylinder", skill: "senior", minutes: 90, consumablesCost: 0,
      access: ["bonnet_open"], cautions: ["hot_parts", "fuel", "rotating_parts", "pressurised_cooling"],
      instructions: [
        "Follow the vehicle maker's procedure: disable fuel injection and ignition so the engine cranks without starting, engine warm but safe to touch.",
        "Remove all plugs (or glow plugs / injectors on a diesel with the right adapter) and crank each cylinder with the throttle open until the gauge stops rising.",
        "Work out the lowest cylinder as a percentage of the highest. On a low cylinder, do a leak-down test and listen at the oil filler, intake and exhaust; open the coolant cap only once the engine is cool and watch for bubbles.",
      ],
      tools: ["compression gauge with adapters", "leak-down tester", "air supply", "scan tool"],
      result: { kind: "measurement", quantity: "lowest cylinder as percent of highest", unit: "",
        rule: "value >= 90", // common practice, from memory: cylinders within about 10% of each other; the maker's figure governs
        failMeans: "One cylinder is low: leak-down shows whether rings (air at the filler), valves (exhaust or intake) or head gasket (bubbles in coolant)." },
      falseAlarm: 0.05 },
    { key: "oil_consumption_measure", name: "Measure oil use over 1000 km", skill: "apprentice", minutes: 20, consumablesCost: 0,
      access: [], cautions: ["hot_parts"],
      instructions: [
        "Follow the vehicle maker's procedure for checking oil: car level, engine off for the time the maker gives.",
        "Fill to the maximum mark, note the odometer and seal the filler with a dated tag.",
        "After about 1000 km, check again on level ground and measure how much oil it takes to reach the same mark.",
        "Compare with the maker's accepted figure; look for outside leaks before blaming the engine.",
      ],
      tools: ["measuring jug", "dated tag"],
      result: { kind: "measurement", quantity: "oil used per 1000 km", unit: "L",
        rule: "value <= 1 L", // common practice: makers commonly accept up to 0.5–1.0 L per 1000 km once run in; maker-specific
        failMeans: "The engine uses more oil than makers commonly accept: find out whether it is burnt (smoke, plugs) or leaked." },
      falseAlarm: 0.05 },
  ],

  symptomLinks: [
    ...producesSymptoms("glow_plugs_failed", { hard_cold_start: 0.8, white_smoke: 0.6, misfire_cold: 0.6, check_engine_light: 0.4 }),
    ...producesSymptoms("egr_valve_sticking", { check_engine_light: 0.6, loss_of_power: 0.6, black_smoke: 0.5, misfire_cold: 0.3 }),
    ...producesSymptoms("valve_stem_seals_worn", { blue_smoke_startup: 0.85, oil_use: 0.5 }),
    ...producesSymptoms("piston_rings_worn", { oil_use: 0.8, blue_smoke_startup: 0.3, loss_of_power: 0.3, misfire_load: 0.2, high_fuel_consumption: 0.1 }),
  ],

  checkLinks: [
    ...bearsOn("glow_plug_resistance", { glow_plugs_failed: 0.9 }),
    ...bearsOn("egr_command_test", { egr_valve_sticking: 0.8 }),
    ...bearsOn("compression_test", { piston_rings_worn: 0.85, head_gasket_failed: 0.5 }),
    ...bearsOn("oil_consumption_measure", { piston_rings_worn: 0.8, valve_stem_seals_worn: 0.6 }),
  ],
};
