// Engine fuelling and emissions, part 4: diesel glow plugs and their control, exhaust-gas
// recirculation, and the turbocharger with its hoses and boost control. The types cannot say
// "turbocharged" yet, so turbo faults apply to combustion engines and their descriptions say so.
import {
  bearsOn,
  COMBUSTION,
  componentNode,
  DIESEL_ONLY,
  failureMode,
  producesSymptoms,
  SAY,
  gradedOn,
} from "./build";
import type { KnowledgeBaseSeed } from "./types";

const fm = (parent: string, f: Parameters<typeof failureMode>[2]) =>
  failureMode("engine_fuel_emissions", parent, f);
const sym = { system: "engine_fuel_emissions" } as const;

export const engineDieselTurbo: KnowledgeBaseSeed = {
  symptoms: [
    {
      ...sym,
      key: "white_smoke",
      name: "White smoke from the exhaust",
      kind: "visible",
      synonyms: [
        "white smoke",
        "steam from the exhaust",
        "clouds of white smoke",
        "smokes white on start-up",
      ],
      conditions: ["cold start", "after warm-up"],
      leak: 0.06,
    }, // condensation steam on a cold morning is normal and clears
    {
      ...sym,
      key: "black_smoke",
      name: "Black smoke under acceleration",
      kind: "visible",
      synonyms: ["black smoke", "sooty exhaust", "smokes when I put my foot down", "soot on the bumper"],
      conditions: ["accelerating", "under load"],
      leak: 0.03,
    },
    {
      ...sym,
      key: "glow_plug_lamp",
      name: "Glow plug lamp flashing or staying on",
      kind: "warning_lamp",
      synonyms: [
        "glow plug light",
        "coil light flashing",
        "pre-heat light stays on",
        "curly light on",
        "heater plug warning",
      ],
      conditions: ["after start-up", "while driving"],
      leak: 0.02,
    },
    {
      ...sym,
      key: "whistle_boost",
      name: "Whistle, whoosh or siren noise under boost",
      kind: "noise",
      synonyms: [
        "turbo whistle",
        "whooshing when accelerating",
        "turbo noise",
        "siren noise from the engine",
        "hissing under load",
      ],
      conditions: ["accelerating", "under load"],
      leak: 0.04,
    }, // a gentle turbo whistle is normal on many engines
    {
      ...sym,
      key: "oil_in_intake",
      name: "Oil inside the intake hoses or intercooler",
      kind: "visible",
      synonyms: [
        "oily intercooler pipes",
        "oil in the turbo hoses",
        "oil in the air intake",
        "wet boost pipe",
      ],
      conditions: ["on inspection"],
      leak: 0.03,
    }, // a light oil film from the breather is normal
  ],

  causes: [
    componentNode(
      "engine_fuel_emissions",
      "engine_diesel",
      "Diesel glow and exhaust-gas recirculation",
      "Glow plugs and their control, and the EGR valve and cooler on diesel engines.",
    ),
    componentNode(
      "engine_fuel_emissions",
      "engine_turbo",
      "Turbocharger and boost",
      "The turbocharger, its boost hoses and intercooler, and the wastegate or variable-vane control.",
    ),
    fm("engine_diesel", {
      key: "glow_plugs_failed",
      name: "Glow plugs failed",
      baseRate: 2.5,
      repairMinutes: 90,
      partsCost: 100,
      priority: "soon",
      description:
        "One or more glow plugs have burnt out: long cranking from cold, white smoke and a rough first minute; the lamp may flash.",
      ownerDescription:
        "One or more of the heaters that help a diesel engine start from cold have burnt out.",
      ifLeft:
        "Cold starts get harder and smokier, which strains the battery and starter; in frost it may not start.",
      applicability: { fuel: DIESEL_ONLY, minKm: 80000, youngFactor: 0.3 },
    }),
    fm("engine_diesel", {
      key: "glow_control_failed",
      name: "Glow plug control unit or relay failed",
      baseRate: 1,
      repairMinutes: 45,
      partsCost: 90,
      priority: "soon",
      description:
        "The relay or control unit that powers the glow plugs (or its feed) has failed: no pre-heat at all, glow lamp and glow circuit codes (P0380, P0670).",
      ownerDescription: "The unit that switches on the diesel's starting heaters has failed.",
      ifLeft: "None of the heaters work, so cold starts are slow and smoky and may fail in cold weather.",
      applicability: { fuel: DIESEL_ONLY, minAgeYears: 5 },
    }),
    fm("engine_diesel", {
      key: "egr_valve_sticking",
      name: "EGR valve sticking from carbon build-up",
      baseRate: 2.5,
      repairMinutes: 120,
      partsCost: 200,
      priority: "soon",
      description:
        "Soot has built up so the valve sticks open or shut: rough idle, black smoke, loss of power and limp mode (P0401 when flow is too low).",
      ownerDescription:
        "A valve that feeds some exhaust gas back into the engine has clogged with soot and is sticking.",
      ifLeft:
        "The engine smokes, loses power and may go into a reduced-power mode; soot also clogs the intake.",
      applicability: { fuel: DIESEL_ONLY, minKm: 80000, youngFactor: 0.3 },
    }),
    fm("engine_diesel", {
      key: "egr_cooler_leak",
      name: "EGR cooler leaking coolant into the intake",
      baseRate: 0.8,
      repairMinutes: 240,
      partsCost: 300,
      priority: "soon",
      description:
        "The small coolant-cooled heat exchanger in the EGR path has cracked: coolant loss with no outside leak, white sweet-smelling smoke, sometimes overheating. Easily mistaken for a head gasket.",
      ownerDescription:
        "The small radiator that cools recirculated exhaust gas has cracked and is leaking coolant into the engine.",
      ifLeft:
        "The engine keeps losing coolant and can overheat; coolant in the cylinders can damage the engine.",
      applicability: { fuel: DIESEL_ONLY, minKm: 120000, youngFactor: 0.2 },
    }),
    fm("engine_turbo", {
      key: "turbo_hose_split",
      name: "Boost hose or intercooler split or off",
      baseRate: 2.5,
      repairMinutes: 45,
      partsCost: 70,
      priority: "soon",
      description:
        "A boost hose has split, a clip has come off or the intercooler leaks: whoosh under load, loss of power, under-boost code (P0299), black smoke on diesels. Turbocharged engines only.",
      ownerDescription:
        "One of the pipes carrying air from the turbocharger to the engine has split or come loose.",
      ifLeft:
        "The car stays down on power, uses more fuel and may go into reduced-power mode; dirt can get drawn in.",
      applicability: { fuel: COMBUSTION, minAgeYears: 5 },
    }),
    fm("engine_turbo", {
      key: "turbo_worn",
      name: "Turbocharger bearings or seals worn",
      baseRate: 1.2,
      repairMinutes: 300,
      partsCost: 600,
      priority: "soon",
      description:
        "Shaft play lets the wheels rub and the seals pass oil: siren whistle, blue smoke, oil in the intercooler, loss of boost. Often after poor oil or oil starvation. Turbocharged engines only.",
      ownerDescription:
        "The turbocharger, which boosts the engine's power, has worn inside and is leaking oil.",
      ifLeft:
        "It can fail completely, sometimes with oil pouring into the engine or exhaust; on diesels that can make the engine run away. Get it seen to soon.",
      applicability: { fuel: COMBUSTION, minKm: 150000, youngFactor: 0.2 },
    }),
    fm("engine_turbo", {
      key: "turbo_actuator_sticking",
      name: "Turbo wastegate or vane actuator sticking",
      baseRate: 1.5,
      repairMinutes: 120,
      partsCost: 250,
      priority: "soon",
      description:
        "Soot-stuck variable vanes or a seized wastegate, or a failing actuator or its vacuum supply: over-boost or under-boost (P0234 / P0299) and limp mode. Turbocharged engines only.",
      ownerDescription: "The part that controls how hard the turbocharger works is sticking.",
      ifLeft: "The car keeps dropping into low-power mode, and too much boost can damage the engine.",
      applicability: { fuel: COMBUSTION, minKm: 100000, youngFactor: 0.3 },
    }),
  ],

  checks: [
    {
      key: "glow_plug_resistance",
      name: "Measure glow plug resistance",
      skill: "technician",
      minutes: 30,
      consumablesCost: 0,
      access: ["bonnet_open", "cold_engine"],
      cautions: ["hot_parts"],
      instructions: [
        "Follow the vehicle maker's procedure; glow plugs and their bus bar get very hot when powered — ignition off, engine cold.",
        "Disconnect the feed from each glow plug and measure from the plug terminal to engine earth with a low-ohm meter.",
        "Compare the plugs with each other and with the maker's figure for this plug; an open circuit reads as infinite.",
        "Read the glow-control fault memory with a scan tool as well.",
      ],
      tools: ["multimeter", "scan tool"],
      result: {
        kind: "measurement",
        quantity: "resistance",
        unit: "ohm",
        rule: "value <= 2 ohm", // from memory, common practice: healthy plugs read well under about 2 Ω cold; maker-specific — use the maker's figure
        failMeans:
          "A glow plug is open or high resistance: replace it (plugs can seize in the head — senior's judgement on removal).",
      },
      falseAlarm: 0.04,
    },
    {
      key: "glow_control_test",
      name: "Check the glow control unit's feed, output and faults",
      skill: "technician",
      minutes: 20,
      consumablesCost: 0,
      access: ["bonnet_open", "scan_tool", "cold_engine"],
      cautions: ["hot_parts"],
      instructions: [
        "Follow the vehicle maker's procedure; glow plugs and the bus bar get hot within seconds of being powered.",
        "Read the glow-control faults, then with a test lamp or meter on the glow plug feed, switch the ignition on from cold: the feed should come on for the pre-heat time.",
        "No output with a good fuse, feed and trigger at the unit fails the unit.",
      ],
      tools: ["scan tool", "multimeter", "test lamp"],
      result: {
        kind: "pass_fail",
        failMeans: "The glow control unit gives no output: check its fuse and feed, then replace the unit.",
      },
      falseAlarm: 0.04,
    },
    {
      key: "egr_command_test",
      name: "Command the EGR valve with the scan tool and watch its position",
      skill: "technician",
      minutes: 30,
      consumablesCost: 0,
      access: ["scan_tool", "bonnet_open"],
      cautions: ["hot_parts", "exhaust_fumes", "rotating_parts"],
      instructions: [
        SAY.RUNNING + " Let the EGR valve and pipes cool before touching them.",
        "With the scan tool, command the valve open and shut and compare commanded with actual position.",
        "If it lags or sticks, remove it and look for carbon on the valve and seat.",
      ],
      tools: ["scan tool", "exhaust extraction"],
      result: {
        kind: "pass_fail",
        failMeans: "The EGR valve does not follow the command: clean or replace the valve.",
      },
      falseAlarm: 0.06,
    },
    {
      key: "egr_cooler_check",
      name: "Pressure-test the cooling system and look for coolant in the EGR path",
      skill: "senior",
      minutes: 60,
      consumablesCost: 0,
      access: ["bonnet_open", "cold_engine"],
      cautions: ["pressurised_cooling", "hot_parts"],
      instructions: [
        SAY.CAP,
        "Pressure-test the cooling system to the pressure stamped on the cap and leave it for the time the maker gives.",
        "Remove the EGR valve or the pipe after the cooler and look for wet coolant, white crust or a steady level drop with no outside leak.",
      ],
      tools: ["cooling system pressure tester", "inspection lamp", "endoscope"],
      result: {
        kind: "pass_fail",
        failMeans: "Coolant is entering the EGR path: replace the EGR cooler before blaming the head gasket.",
      },
      falseAlarm: 0.05,
    },
    {
      key: "boost_pressure_log",
      name: "Log actual against requested boost on a full-load pull",
      skill: "technician",
      minutes: 20,
      consumablesCost: 0,
      access: ["scan_tool", "road_test"],
      cautions: [],
      instructions: [
        "On a safe road with a second person watching the scan tool, make a full-throttle pull in a middle gear from low revs.",
        "Record requested and actual boost at the point where the gap is largest; use the maker's figure for the allowed gap where it gives one.",
        "Actual boost that lags far behind (under-boost) or overshoots (over-boost) points to leaks, the actuator or the turbocharger itself.",
      ],
      tools: ["scan tool with logging"],
      result: {
        kind: "measurement",
        quantity: "actual boost as percent of requested",
        unit: "",
        rule: "value >= 90 and value <= 110", // from memory, common practice: within about 10% of requested under steady full load; maker-specific — use the maker's figure
        failMeans:
          "Boost does not follow the request: leak-test the intake, then test the actuator and the turbo.",
      },
      falseAlarm: 0.06,
    },
    {
      key: "boost_leak_test",
      name: "Pressurise the intake with a boost leak tester",
      skill: "technician",
      minutes: 30,
      consumablesCost: 0,
      access: ["bonnet_open", "cold_engine"],
      cautions: ["hot_parts"],
      instructions: [
        "Follow the vehicle maker's procedure; engine off and cooled, the turbo stays hot for a long time.",
        "Fit the tester in place of the air-filter hose and pressurise gently to a low pressure (well below full boost).",
        "Listen and spray soapy water along every hose, clip, the intercooler and its end tanks for escaping air.",
      ],
      tools: ["boost leak tester", "soapy water spray", "air supply with regulator"],
      result: {
        kind: "pass_fail",
        failMeans: "Air escapes at a hose, clip or the intercooler: repair it and log the boost again.",
      },
      falseAlarm: 0.04,
    },
    {
      key: "turbo_shaft_play",
      name: "Feel the turbo shaft for play and look for oil",
      skill: "technician",
      minutes: 25,
      consumablesCost: 0,
      access: ["bonnet_open", "cold_engine"],
      cautions: ["hot_parts"],
      instructions: [
        "Follow the vehicle maker's procedure; engine off and cooled, the turbo and exhaust stay hot long after switch-off.",
        "Remove the intake hose at the turbo and look at the compressor wheel and housing for rub marks and oil.",
        "Rock the shaft gently side to side and in and out: a little side play is normal on many turbos; the wheel touching the housing, or end float you can feel, is a fail.",
      ],
      tools: ["inspection lamp", "endoscope"],
      result: {
        kind: "pass_fail",
        failMeans:
          "The turbo shaft has worn or the wheel has rubbed: replace or recondition the turbo and find the cause (oil supply, air filter).",
      },
      falseAlarm: 0.06,
    },
    {
      key: "turbo_actuator_test",
      name: "Command the boost actuator and watch the linkage move",
      skill: "technician",
      minutes: 20,
      consumablesCost: 0,
      access: ["bonnet_open", "scan_tool"],
      cautions: ["hot_parts"],
      instructions: [
        "Follow the vehicle maker's procedure; engine off, ignition on, keep fingers away from the linkage while it is commanded; the turbo may still be hot.",
        "Command the actuator through its range with the scan tool and watch the arm move smoothly end to end; check any vacuum hose and solenoid.",
        "A sticking or jerking linkage, or one that does not reach its stops, is a fail.",
      ],
      tools: ["scan tool", "hand vacuum pump", "inspection lamp"],
      result: {
        kind: "pass_fail",
        failMeans: "The vanes, wastegate or actuator stick: free or replace them, then log the boost again.",
      },
      falseAlarm: 0.05,
    },
  ],

  symptomLinks: [
    ...producesSymptoms("glow_plugs_failed", {
      hard_cold_start: 0.8,
      white_smoke: 0.6,
      misfire_cold: 0.6,
      check_engine_light: 0.4,
      glow_plug_lamp: 0.5,
    }),
    ...producesSymptoms("glow_control_failed", {
      hard_cold_start: 0.8,
      glow_plug_lamp: 0.8,
      white_smoke: 0.5,
    }),
    ...producesSymptoms("egr_valve_sticking", {
      check_engine_light: 0.6,
      loss_of_power: 0.6,
      black_smoke: 0.5,
      misfire_cold: 0.3,
      stalls_idle: 0.2,
    }),
    ...producesSymptoms("egr_cooler_leak", {
      coolant_loss: 0.6,
      white_smoke: 0.5,
      overheat_load: 0.2,
      coolant_smell: 0.2,
    }),
    ...producesSymptoms("turbo_hose_split", {
      loss_of_power: 0.8,
      whistle_boost: 0.6,
      black_smoke: 0.3,
      check_engine_light: 0.5,
      oil_in_intake: 0.3,
    }),
    ...producesSymptoms("turbo_worn", {
      whistle_boost: 0.6,
      blue_smoke_load: 0.5,
      loss_of_power: 0.5,
      oil_use: 0.3,
      oil_in_intake: 0.6,
    }),
    ...producesSymptoms("turbo_actuator_sticking", {
      loss_of_power: 0.7,
      check_engine_light: 0.7,
      black_smoke: 0.2,
      whistle_boost: 0.1,
    }),
  ],

  checkLinks: [
    ...gradedOn("glow_plug_resistance", {
      glow_plugs_failed: { well_within: 0.04, near: 0.06, beyond: 0.2, far_beyond: 0.7 },
    }),
    ...bearsOn("glow_control_test", { glow_control_failed: 0.85, glow_plugs_failed: 0.2 }),
    ...bearsOn("egr_command_test", { egr_valve_sticking: 0.8 }),
    ...bearsOn("egr_cooler_check", { egr_cooler_leak: 0.8, head_gasket_failed: 0.3 }),
    ...bearsOn("boost_pressure_log", {
      turbo_hose_split: 0.8,
      turbo_actuator_sticking: 0.8,
      turbo_worn: 0.6,
      map_sensor_fault: 0.3,
    }),
    ...bearsOn("boost_leak_test", { turbo_hose_split: 0.9 }),
    ...bearsOn("turbo_shaft_play", { turbo_worn: 0.8 }),
    ...bearsOn("turbo_actuator_test", { turbo_actuator_sticking: 0.8 }),
  ],
};
