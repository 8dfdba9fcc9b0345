// Engine mechanical, part 1: oil leaks (cam cover, sump, crank and cam seals, filter housing,
// turbo oil pipes, sump plug), oil burning (valve stem seals, rings, crankcase breather) and the
// cylinder-head gasket. Part 2 (timing and belts, lubrication) is engine-timing-lubrication.ts.
// The component "cooling_head_gasket" kept its key when it moved here from the cooling system.
import { bearsOn, COMBUSTION, componentNode, failureMode, producesSymptoms, SAY, systemNode } from "./build";
import type { KnowledgeBaseSeed } from "./types";

const fm = (parent: string, f: Parameters<typeof failureMode>[2]) =>
  failureMode("engine_mechanical", parent, f);
const sym = { system: "engine_mechanical" } as const;
const AGED = (minAgeYears: number) => ({ fuel: COMBUSTION, minAgeYears });
const WORN = (minKm: number) => ({ fuel: COMBUSTION, minKm, youngFactor: 0.2 });

export const engineMechanical: KnowledgeBaseSeed = {
  symptoms: [
    {
      ...sym,
      key: "oil_use",
      name: "Uses oil between services",
      kind: "consumption",
      synonyms: [
        "burns oil",
        "uses oil",
        "oil level keeps dropping",
        "topping up oil",
        "drinks oil",
        "oil consumption",
      ],
      conditions: ["over several weeks"],
      leak: 0.04,
    }, // about a litre a month deserves a look, a litre a year does not matter (common practice)
    {
      ...sym,
      key: "blue_smoke_startup",
      name: "Blue smoke on start-up",
      kind: "visible",
      synonyms: [
        "blue smoke",
        "smokes in the morning",
        "oily smoke",
        "puff of smoke on start",
        "burning oil smell from the exhaust",
      ],
      conditions: ["cold start", "after idling"],
      leak: 0.01,
    },
    {
      ...sym,
      key: "blue_smoke_load",
      name: "Blue smoke under acceleration or on the overrun",
      kind: "visible",
      synonyms: [
        "blue smoke when accelerating",
        "smokes when I lift off",
        "blue haze behind the car",
        "oily smoke at speed",
      ],
      conditions: ["accelerating", "on the overrun"],
      leak: 0.01,
    },
    {
      ...sym,
      key: "oil_leak_drips",
      name: "Engine oil dripping under the car",
      kind: "leak",
      synonyms: [
        "oil leak",
        "oil on the drive",
        "oil patch under the engine",
        "engine wet with oil",
        "oily underside",
      ],
      conditions: ["parked", "on the ramp"],
      leak: 0.03,
    },
    {
      ...sym,
      key: "burning_oil_smell",
      name: "Hot oil smell from the engine bay",
      kind: "smell",
      synonyms: [
        "burning oil smell",
        "smoke from under the bonnet",
        "oil burning on the exhaust",
        "hot oil smell through the vents",
      ],
      conditions: ["after driving", "warm engine"],
      leak: 0.03,
    },
    {
      ...sym,
      key: "sludge_oil_cap",
      name: "Creamy sludge under the oil filler cap",
      kind: "visible",
      synonyms: [
        "mayonnaise on the oil cap",
        "white gunk under the filler cap",
        "milky oil",
        "emulsion on the dipstick",
      ],
      conditions: ["short trips", "cold weather"],
      leak: 0.05,
    }, // short trips in winter condense water there without any fault
    {
      ...sym,
      key: "crankcase_pressure",
      name: "Oil pushed out of the dipstick tube or filler, or fumes from the filler",
      kind: "visible",
      synonyms: [
        "dipstick pops out",
        "smoke from the oil filler",
        "blow-by",
        "oil spraying from the dipstick",
        "crankcase pressure",
      ],
      conditions: ["engine running", "under load"],
      leak: 0.02,
    },
  ],

  causes: [
    systemNode(
      "engine_mechanical",
      "Engine mechanical",
      "The engine's own parts: seals and gaskets, valves, pistons and rings, head gasket, timing drive, belts and lubrication.",
    ),
    componentNode(
      "engine_mechanical",
      "engine_oil_leaks",
      "Oil seals and gaskets",
      "Cam cover and sump gaskets, crank and cam seals, oil filter housing, turbo oil pipes and the sump plug.",
    ),
    componentNode(
      "engine_mechanical",
      "engine_oil_burning",
      "Valves, rings and crankcase breather",
      "Valve stem seals and guides, pistons and rings, and the breather that vents crankcase gas.",
    ),
    componentNode(
      "engine_mechanical",
      "cooling_head_gasket",
      "Cylinder head gasket",
      "The seal between head and block that keeps combustion gas, oil and coolant apart.",
    ),
    fm("engine_oil_leaks", {
      key: "cam_cover_gasket_leak",
      name: "Rocker or cam cover gasket leaking",
      baseRate: 4,
      repairMinutes: 75,
      partsCost: 35,
      priority: "watch",
      description:
        "The hardened gasket weeps oil down the head and onto the exhaust manifold or into the plug wells: hot oil smell, oily head, misfires from oil in the coil wells.",
      ownerDescription:
        "The seal under the cover on top of the engine has hardened and is letting oil seep out.",
      ifLeft:
        "Oil keeps dripping onto hot parts, which smells and is a small fire risk, and can cause misfires.",
      applicability: AGED(6),
    }),
    fm("engine_oil_leaks", {
      key: "sump_gasket_leak",
      name: "Sump gasket or sealant leaking",
      baseRate: 2,
      repairMinutes: 150,
      partsCost: 40,
      priority: "watch",
      description:
        "Oil weeps from the joint between the sump and the block: drips under the engine and an oily subframe.",
      ownerDescription: "The seal around the oil pan at the bottom of the engine is leaking.",
      ifLeft:
        "The drips continue and the oil level falls; if nobody tops up, the engine can run short of oil.",
      applicability: AGED(8),
    }),
    fm("engine_oil_leaks", {
      key: "crank_seal_front_leak",
      name: "Front crankshaft oil seal leaking",
      baseRate: 1,
      repairMinutes: 180,
      partsCost: 20,
      priority: "soon",
      description:
        "The seal behind the crank pulley leaks: oil flung round the belt area, on the auxiliary belt and, on belt engines, onto the timing belt.",
      ownerDescription: "The oil seal at the front of the engine, behind the drive belt pulley, is leaking.",
      ifLeft:
        "Oil gets onto the drive belts, which then slip and wear; on some engines it rots the timing belt.",
      applicability: WORN(120000),
    }),
    fm("engine_oil_leaks", {
      key: "crank_seal_rear_leak",
      name: "Rear crankshaft oil seal leaking",
      baseRate: 1,
      repairMinutes: 360,
      partsCost: 30,
      priority: "soon",
      description:
        "The seal between engine and gearbox leaks: oil from the bell housing drain, and oil can reach the clutch and make it slip or judder.",
      ownerDescription: "The oil seal between the engine and the gearbox is leaking.",
      ifLeft:
        "The leak grows and oil can ruin the clutch; the repair means separating engine and gearbox, so it is often done with a clutch.",
      applicability: WORN(150000),
    }),
    fm("engine_oil_leaks", {
      key: "cam_seal_leak",
      name: "Camshaft oil seal leaking",
      baseRate: 1,
      repairMinutes: 180,
      partsCost: 20,
      priority: "soon",
      description:
        "A seal at the end of the camshaft leaks behind the timing cover: oil down the front of the engine and onto the timing belt.",
      ownerDescription: "An oil seal at the end of the camshaft, near the timing belt, is leaking.",
      ifLeft: "Oil can soak the timing belt, which then wears and can break, badly damaging the engine.",
      applicability: WORN(120000),
    }),
    fm("engine_oil_leaks", {
      key: "oil_filter_housing_leak",
      name: "Oil filter housing or oil cooler gasket leaking",
      baseRate: 1.5,
      repairMinutes: 120,
      partsCost: 40,
      priority: "soon",
      description:
        "The housing's gaskets harden and weep: oil running down the block, onto the exhaust or starter; on some engines oil mixes with coolant.",
      ownerDescription: "The seals on the housing that holds the oil filter are leaking.",
      ifLeft: "The leak gets worse, oil reaches hot parts and the starter, and the oil level drops.",
      applicability: AGED(6),
    }),
    fm("engine_oil_leaks", {
      key: "turbo_oil_line_leak",
      name: "Turbo oil feed or return pipe leaking",
      baseRate: 0.8,
      repairMinutes: 120,
      partsCost: 60,
      priority: "soon",
      description:
        "A banjo washer, flange gasket or the pipe itself leaks next to the hot turbo: smoke from the engine bay and a burning smell. Turbocharged engines only.",
      ownerDescription:
        "A pipe that carries oil to or from the turbocharger is leaking next to very hot parts.",
      ifLeft: "Oil on the hot turbo smokes and can catch fire, and a turbo short of oil fails quickly.",
      applicability: AGED(6),
    }),
    fm("engine_oil_leaks", {
      key: "sump_plug_leak",
      name: "Sump plug or its washer leaking",
      baseRate: 1,
      repairMinutes: 15,
      partsCost: 3,
      priority: "watch",
      description:
        "A washer not renewed at the last oil change, an over-tightened plug or a damaged thread: a steady drip from the lowest point of the sump.",
      ownerDescription:
        "The drain plug at the bottom of the engine is dripping oil, usually because its washer needs replacing.",
      ifLeft:
        "It keeps dripping; a damaged thread can let the plug come loose, which would empty the engine.",
      applicability: { fuel: COMBUSTION },
    }),
    fm("engine_oil_burning", {
      key: "valve_stem_seals_worn",
      name: "Valve-stem seals or guides worn",
      baseRate: 1.5,
      repairMinutes: 360,
      partsCost: 80,
      priority: "watch",
      description:
        "Oil seeps down the valve stems while the engine stands and burns off as a puff of blue smoke on start-up.",
      ownerDescription:
        "Small seals inside the engine's cylinder head have worn, so a little oil leaks in while the car stands and burns off at start-up.",
      ifLeft: "Oil use and smoke slowly increase and the spark plugs and catalytic converter get fouled.",
      applicability: WORN(150000),
    }),
    fm("engine_oil_burning", {
      key: "piston_rings_worn",
      name: "Piston rings worn (oil burning, low compression)",
      baseRate: 0.8,
      repairMinutes: 900,
      partsCost: 600,
      priority: "soon",
      description:
        "Worn or stuck rings let oil into the cylinders and gas past: heavy oil use, blue smoke under load, loss of power and low compression.",
      ownerDescription:
        "The rings that seal the pistons inside the engine have worn, so the engine burns oil and loses power.",
      ifLeft:
        "Oil use keeps rising; if the level is not watched the engine can run dry, and the catalytic converter will be ruined.",
      applicability: { fuel: COMBUSTION, minKm: 200000, youngFactor: 0.1 },
    }),
    fm("engine_oil_burning", {
      key: "breather_fault",
      name: "Crankcase breather blocked or its valve split",
      baseRate: 1.5,
      repairMinutes: 60,
      partsCost: 50,
      priority: "soon",
      description:
        "A blocked breather or split diaphragm builds pressure in the crankcase or lets unmetered air in: oil pushed past seals and up the dipstick, oil in the intake, lean running and whistling idle.",
      ownerDescription: "The valve and pipes that let the engine's crankcase breathe are blocked or split.",
      ifLeft:
        "Pressure forces oil out of the seals, the engine uses more oil and can run roughly; seals may start leaking.",
      applicability: WORN(80000),
    }),
    fm("cooling_head_gasket", {
      key: "head_gasket_failed",
      name: "Cylinder-head gasket failed",
      baseRate: 0.8,
      repairMinutes: 600,
      partsCost: 250,
      priority: "stop",
      description:
        "Combustion gas is pushed into the coolant or coolant into a cylinder: overheating, coolant loss, white sweet-smelling exhaust. Driving on can destroy the engine.",
      ownerDescription:
        "The seal between the two main parts of the engine has failed, so coolant, oil and exhaust gas are mixing.",
      ifLeft:
        "The engine overheats and can be wrecked beyond repair. It should not be driven until it is fixed.",
      applicability: { fuel: COMBUSTION, minKm: 100000, youngFactor: 0.3 },
    }),
  ],

  checks: [
    {
      key: "compression_test",
      name: "Compression test, then leak-down on any low cylinder",
      skill: "senior",
      minutes: 90,
      consumablesCost: 0,
      access: ["bonnet_open"],
      cautions: ["hot_parts", "fuel", "rotating_parts", "pressurised_cooling"],
      instructions: [
        "Follow the vehicle maker's procedure: disable fuel injection and ignition so the engine cranks without starting, engine warm but safe to touch.",
        "Remove all plugs (or glow plugs / injectors on a diesel with the right adapter) and crank each cylinder with the throttle open until the gauge stops rising.",
        "Work out the lowest cylinder as a percentage of the highest. On a low cylinder, do a leak-down test and listen at the oil filler, intake and exhaust; open the coolant cap only once the engine is cool and watch for bubbles.",
      ],
      tools: ["compression gauge with adapters", "leak-down tester", "air supply", "scan tool"],
      result: {
        kind: "measurement",
        quantity: "lowest cylinder as percent of highest",
        unit: "",
        rule: "value >= 90", // common practice, from memory: cylinders within about 10% of each other; the maker's figure governs
        failMeans:
          "One cylinder is low: leak-down shows whether rings (air at the filler), valves (exhaust or intake) or head gasket (bubbles in coolant).",
      },
      falseAlarm: 0.05,
    },
    {
      key: "leakdown_test",
      name: "Cylinder leak-down test",
      skill: "senior",
      minutes: 60,
      consumablesCost: 0,
      access: ["bonnet_open", "cold_engine"],
      cautions: ["hot_parts", "rotating_parts", "pressurised_cooling"],
      instructions: [
        SAY.CAP +
          " Hold the crank with a bar on the pulley bolt: air into a cylinder off top dead centre can spin the engine suddenly.",
        "Bring each cylinder to top dead centre on compression, fit the tester to the plug or glow-plug hole and apply the tester's regulated air.",
        "Read the leakage and listen: at the oil filler means rings, at the intake or exhaust means valves, bubbles in the expansion tank mean the head gasket. Compare with the tester's and the maker's figures.",
      ],
      tools: ["leak-down tester", "air supply", "breaker bar", "stethoscope"],
      result: {
        kind: "measurement",
        quantity: "leakage (percent)",
        unit: "",
        rule: "value <= 20", // from memory, common practice: healthy cylinders commonly leak under about 10–20%; maker-specific
        failMeans:
          "The cylinder leaks too much: where the air escapes names the part (rings, valve or head gasket).",
      },
      falseAlarm: 0.05,
    },
    {
      key: "oil_consumption_measure",
      name: "Measure oil use over 1000 km",
      skill: "apprentice",
      minutes: 20,
      consumablesCost: 0,
      access: [],
      cautions: ["hot_parts"],
      instructions: [
        "Follow the vehicle maker's procedure for checking oil: car level, engine off for the time the maker gives; the dipstick tube can be next to hot parts.",
        "Fill to the maximum mark, note the odometer and seal the filler with a dated tag.",
        "After about 1000 km, check again on level ground and measure how much oil it takes to reach the same mark.",
        "Compare with the maker's accepted figure; look for outside leaks before blaming the engine.",
      ],
      tools: ["measuring jug", "dated tag"],
      result: {
        kind: "measurement",
        quantity: "oil used per 1000 km",
        unit: "L",
        rule: "value <= 1 L", // common practice (SOURCES.md): makers commonly accept up to 0.5–1.0 L per 1000 km once run in; maker-specific
        failMeans:
          "The engine uses more oil than makers commonly accept: find out whether it is burnt (smoke, plugs) or leaked.",
      },
      falseAlarm: 0.05,
    },
    {
      key: "oil_leak_visual_ramp",
      name: "Find the highest wet point of an oil leak on the ramp",
      skill: "apprentice",
      minutes: 20,
      consumablesCost: 0,
      access: ["ramp", "bonnet_open"],
      cautions: ["lifting", "hot_parts"],
      instructions: [
        SAY.LIFT + " Let the engine and exhaust cool; they burn.",
        "Oil runs down and back in the airflow: start at the lowest wet point and follow the trail upwards to the highest wet point, from above and below.",
        "Note the part at the top of the trail (cam cover, filter housing, seal, sump, plug) and photograph it.",
      ],
      tools: ["inspection lamp", "inspection mirror", "camera"],
      result: {
        kind: "pass_fail",
        failMeans: "Oil is leaking: the highest wet point names the gasket or seal to renew.",
      },
      falseAlarm: 0.06,
    },
    {
      key: "oil_leak_uv_trace",
      name: "Trace an oil leak with UV dye",
      skill: "technician",
      minutes: 45,
      consumablesCost: 8,
      access: ["ramp", "bonnet_open"],
      cautions: ["lifting", "hot_parts", "exhaust_fumes", "rotating_parts"],
      instructions: [
        SAY.LIFT + " " + SAY.RUNNING,
        "Degrease the suspect area, add the dye to the engine oil and run the engine to working temperature (or return the car after a drive); the engine will be hot.",
        "Engine off, look over the engine from above and below with the UV lamp: the brightest, freshest glow marks the leak.",
      ],
      tools: ["oil leak dye", "UV lamp and glasses", "degreaser", "exhaust extraction"],
      result: {
        kind: "pass_fail",
        failMeans: "The dye shows where the oil escapes: renew that gasket or seal.",
      },
      falseAlarm: 0.04,
    },
    {
      key: "cam_cover_inspect",
      name: "Look round the cam cover edge and in the plug wells for oil",
      skill: "apprentice",
      minutes: 15,
      consumablesCost: 0,
      access: ["bonnet_open", "cold_engine"],
      cautions: ["hot_parts"],
      instructions: [
        "Follow the vehicle maker's procedure; work on a cold engine, the exhaust manifold sits just below the cam cover.",
        "Look along the whole joint of the cam cover, especially at the back and the ends, for wet oil and dust stuck to it.",
        "Where the coils sit in the cover, lift one and look for oil standing in the plug well.",
      ],
      tools: ["inspection lamp", "inspection mirror"],
      result: {
        kind: "pass_fail",
        failMeans:
          "The cam cover gasket or plug-well seals leak: renew the gasket and seals, clean the wells.",
      },
      falseAlarm: 0.05,
    },
    {
      key: "breather_check",
      name: "Check crankcase pressure and the breather valve and hoses",
      skill: "technician",
      minutes: 20,
      consumablesCost: 0,
      access: ["bonnet_open"],
      cautions: ["hot_parts", "exhaust_fumes", "rotating_parts"],
      instructions: [
        SAY.RUNNING + " The breather and its hoses sit on a hot engine.",
        "At warm idle, loosen the oil filler cap slightly: a strong suction or strong push (rather than a gentle pull) is suspect; measure with a manometer at the dipstick tube where available.",
        "Engine off, check the breather valve and hoses for blockage, oil sludge and split diaphragms.",
      ],
      tools: ["manometer", "inspection lamp", "exhaust extraction"],
      result: {
        kind: "pass_fail",
        failMeans:
          "The breather is blocked or split, or blow-by is high: repair the breather; if blow-by stays high, test the rings.",
      },
      falseAlarm: 0.06,
    },
    {
      key: "oil_cap_sludge_inspect",
      name: "Look under the oil cap and at the coolant for sludge and mixing",
      skill: "apprentice",
      minutes: 5,
      consumablesCost: 0,
      access: ["bonnet_open", "cold_engine"],
      cautions: ["pressurised_cooling", "hot_parts"],
      instructions: [
        SAY.CAP,
        "Look under the oil filler cap and on the dipstick for creamy sludge, and in the expansion tank for oil or brown scum.",
        "Ask about the car's use: a little sludge under the cap is common after short winter trips and means nothing by itself.",
      ],
      tools: ["inspection lamp"],
      result: {
        kind: "pass_fail",
        failMeans:
          "Oil and coolant are mixing, or sludge is heavy: test the head gasket (and, on some engines, the oil cooler).",
      },
      falseAlarm: 0.15,
    },
  ],

  symptomLinks: [
    ...producesSymptoms("cam_cover_gasket_leak", {
      burning_oil_smell: 0.6,
      oil_leak_drips: 0.3,
      oil_use: 0.15,
      misfire_load: 0.1,
    }),
    ...producesSymptoms("sump_gasket_leak", { oil_leak_drips: 0.85, oil_use: 0.2 }),
    ...producesSymptoms("crank_seal_front_leak", {
      oil_leak_drips: 0.7,
      burning_oil_smell: 0.2,
      belt_squeal: 0.2,
    }),
    ...producesSymptoms("crank_seal_rear_leak", {
      gearbox_oil_leak: 0.6,
      oil_leak_drips: 0.5,
      clutch_slip: 0.1,
    }),
    ...producesSymptoms("cam_seal_leak", { oil_leak_drips: 0.5, burning_oil_smell: 0.3 }),
    ...producesSymptoms("oil_filter_housing_leak", { oil_leak_drips: 0.7, burning_oil_smell: 0.4 }),
    ...producesSymptoms("turbo_oil_line_leak", { burning_oil_smell: 0.6, oil_leak_drips: 0.4 }),
    ...producesSymptoms("sump_plug_leak", { oil_leak_drips: 0.9, oil_use: 0.1 }),
    ...producesSymptoms("valve_stem_seals_worn", { blue_smoke_startup: 0.85, oil_use: 0.5 }),
    ...producesSymptoms("piston_rings_worn", {
      oil_use: 0.8,
      blue_smoke_startup: 0.3,
      loss_of_power: 0.3,
      misfire_load: 0.2,
      high_fuel_consumption: 0.1,
      blue_smoke_load: 0.5,
      crankcase_pressure: 0.6,
    }),
    ...producesSymptoms("breather_fault", {
      crankcase_pressure: 0.6,
      oil_use: 0.3,
      idle_hunting: 0.2,
      oil_leak_drips: 0.3,
      oil_in_intake: 0.4,
      check_engine_light: 0.2,
      sludge_oil_cap: 0.3,
    }),
    ...producesSymptoms("head_gasket_failed", {
      coolant_loss: 0.7,
      white_smoke: 0.6,
      overheat_load: 0.6,
      overheat_traffic: 0.4,
      coolant_smell: 0.3,
      misfire_cold: 0.3,
      sludge_oil_cap: 0.3,
      bubbles_expansion_tank: 0.6,
    }),
  ],

  checkLinks: [
    ...bearsOn("compression_test", { piston_rings_worn: 0.85, head_gasket_failed: 0.5 }),
    ...bearsOn("leakdown_test", { piston_rings_worn: 0.8, head_gasket_failed: 0.7 }),
    ...bearsOn("oil_consumption_measure", {
      piston_rings_worn: 0.8,
      valve_stem_seals_worn: 0.6,
      breather_fault: 0.3,
      turbo_worn: 0.4,
    }),
    ...bearsOn("oil_leak_visual_ramp", { engine_oil_leaks: 0.6, gearbox_oil_low: 0.3, pas_hose_leak: 0.2 }),
    ...bearsOn("oil_leak_uv_trace", {
      cam_cover_gasket_leak: 0.85,
      sump_gasket_leak: 0.85,
      crank_seal_front_leak: 0.85,
      crank_seal_rear_leak: 0.8,
      cam_seal_leak: 0.85,
      oil_filter_housing_leak: 0.85,
      turbo_oil_line_leak: 0.8,
      sump_plug_leak: 0.85,
    }),
    ...bearsOn("cam_cover_inspect", { cam_cover_gasket_leak: 0.85, cam_seal_leak: 0.3 }),
    ...bearsOn("breather_check", { breather_fault: 0.8, piston_rings_worn: 0.5 }),
    ...bearsOn("oil_cap_sludge_inspect", { head_gasket_failed: 0.5, breather_fault: 0.4 }),
  ],
};
