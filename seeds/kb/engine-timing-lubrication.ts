// Engine mechanical, part 2: the timing belt or chain, the auxiliary (drive) belt and its tensioner,
// and lubrication (oil level, pressure, pump, lifters, bearings). The system node is in
// engine-mechanical.ts.
import { bearsOn, COMBUSTION, componentNode, failureMode, producesSymptoms, SAY } from "./build";
import type { KnowledgeBaseSeed } from "./types";

const fm = (parent: string, f: Parameters<typeof failureMode>[2]) =>
  failureMode("engine_mechanical", parent, f);
const sym = { system: "engine_mechanical" } as const;

export const engineTimingLubrication: KnowledgeBaseSeed = {
  symptoms: [
    {
      ...sym,
      key: "oil_pressure_lamp",
      name: "Oil pressure warning lamp on or flickering",
      kind: "warning_lamp",
      synonyms: [
        "oil light on",
        "red oil can light",
        "oil pressure light",
        "oil lamp flickers at idle",
        "oil warning light",
      ],
      conditions: ["at idle", "warm engine", "while driving"],
      leak: 0.02,
    },
    {
      ...sym,
      key: "oil_level_lamp",
      name: "Low oil level warning on",
      kind: "warning_lamp",
      synonyms: ["oil level light", "yellow oil light", "top up oil message", "oil level low warning"],
      conditions: ["after start-up"],
      leak: 0.03,
    },
    {
      ...sym,
      key: "tick_top_end",
      name: "Ticking or tapping from the top of the engine",
      kind: "noise",
      synonyms: [
        "ticking engine",
        "tapping noise",
        "tappet noise",
        "clicking from the engine",
        "lifter tick",
      ],
      conditions: ["at idle", "cold start"],
      leak: 0.04,
    }, // injector tick on direct-injection engines is normal
    {
      ...sym,
      key: "knock_bottom_end",
      name: "Deep knock from the bottom of the engine that rises with revs",
      kind: "noise",
      synonyms: [
        "engine knocking",
        "big end knock",
        "deep knock from the engine",
        "hammering noise from the engine",
        "rod knock",
      ],
      conditions: ["under load", "warm engine"],
      leak: 0.01,
    },
    {
      ...sym,
      key: "rattle_cold_start_timing",
      name: "Rattle from the timing end for a few seconds after a cold start",
      kind: "noise",
      synonyms: [
        "timing chain rattle",
        "rattle on start-up",
        "chain noise when cold",
        "rattle that goes after a few seconds",
      ],
      conditions: ["cold start"],
      leak: 0.03,
    },
    {
      ...sym,
      key: "belt_squeal",
      name: "Squeal from the drive belt on start-up or with the steering on lock",
      kind: "noise",
      synonyms: [
        "belt squeal",
        "fan belt squealing",
        "screech when starting",
        "squeal in the wet",
        "chirping belt",
      ],
      conditions: ["cold start", "wet weather", "turning at full lock"],
      leak: 0.04,
    },
    {
      ...sym,
      key: "front_engine_whirr",
      name: "Whirr or rumble from the belt end of the engine",
      kind: "noise",
      synonyms: [
        "rumble from the pulleys",
        "bearing noise from the front of the engine",
        "whining from the belts",
        "grinding from the engine pulleys",
      ],
      conditions: ["at idle", "engine running"],
      leak: 0.03,
    },
    {
      ...sym,
      key: "timing_belt_due",
      name: "Timing belt due or no record of its last change",
      kind: "visible",
      synonyms: [
        "cambelt due",
        "timing belt overdue",
        "no record of cam belt change",
        "cambelt change needed",
        "timing belt cracked",
      ],
      conditions: ["at a service", "buying a used car"],
      leak: 0.05,
    },
  ],

  causes: [
    componentNode(
      "engine_mechanical",
      "engine_timing_drive",
      "Timing drive and belts",
      "Timing belt or chain with its tensioner and guides, and the auxiliary belt with its tensioner and idlers.",
    ),
    componentNode(
      "engine_mechanical",
      "engine_lubrication",
      "Lubrication",
      "Oil level, pump and pick-up, pressure switch, hydraulic lifters and the main and big-end bearings.",
    ),
    fm("engine_timing_drive", {
      key: "timing_belt_worn",
      name: "Timing belt worn, cracked or overdue",
      baseRate: 1.5,
      repairMinutes: 240,
      partsCost: 180,
      priority: "soon",
      description:
        "The belt has passed the maker's interval (years or distance), is cracked or oil-soaked, or its tensioner is noisy; on many engines a snapped belt lets valves hit pistons.",
      ownerDescription:
        "The toothed belt that keeps the engine's parts in step is due for replacement or has started to crack.",
      ifLeft:
        "It can snap without warning; the car stops, and on many engines the damage inside costs far more than the belt change.",
      applicability: { fuel: COMBUSTION, minAgeYears: 5, minKm: 90000, youngFactor: 0.3 },
    }),
    fm("engine_timing_drive", {
      key: "timing_chain_stretched",
      name: "Timing chain stretched or tensioner worn",
      baseRate: 1.2,
      repairMinutes: 420,
      partsCost: 300,
      priority: "soon",
      description:
        "The chain has worn long or the tensioner or guides have worn: a rattle for a few seconds after a cold start, cam–crank correlation codes (P0016), rough running.",
      ownerDescription:
        "The chain that keeps the engine's parts in step has stretched, so it rattles when the engine starts.",
      ifLeft: "It rattles more and more; a chain that jumps a tooth or breaks can badly damage the engine.",
      applicability: { fuel: COMBUSTION, minKm: 120000, youngFactor: 0.2 },
    }),
    fm("engine_timing_drive", {
      key: "aux_belt_worn",
      name: "Auxiliary drive belt worn, glazed or slipping",
      baseRate: 3,
      repairMinutes: 30,
      partsCost: 30,
      priority: "soon",
      description:
        "The ribbed belt that drives the alternator, pump and air-con has cracked, glazed or lost tension: squeal on start-up and full lock, charging warning if it slips.",
      ownerDescription:
        "The drive belt at the front of the engine has worn and is slipping, which causes the squeal.",
      ifLeft:
        "If it breaks, the battery stops charging, and on many cars the power steering and water pump stop too.",
      applicability: { fuel: COMBUSTION, minKm: 60000, youngFactor: 0.3 },
    }),
    fm("engine_timing_drive", {
      key: "aux_belt_tensioner_worn",
      name: "Auxiliary belt tensioner or idler pulley worn",
      baseRate: 1.5,
      repairMinutes: 45,
      partsCost: 70,
      priority: "soon",
      description:
        "The tensioner's spring has weakened or a pulley bearing is dry: whirr or rumble from the front of the engine, a flapping belt and squeal.",
      ownerDescription:
        "The pulley that keeps the drive belt tight has worn, which makes the whirring noise.",
      ifLeft:
        "The pulley can seize or break up and throw the belt off, stopping the charging and often the power steering.",
      applicability: { fuel: COMBUSTION, minKm: 100000, youngFactor: 0.3 },
    }),
    fm("engine_lubrication", {
      key: "oil_level_low",
      name: "Engine oil level low (not topped up)",
      baseRate: 3,
      repairMinutes: 10,
      partsCost: 15,
      priority: "soon",
      description:
        "The level has fallen below the minimum between services; it warns on cars with a level sensor and, once very low, makes the pressure lamp flicker at idle and corners.",
      ownerDescription: "The engine is low on oil and needs topping up now.",
      ifLeft:
        "Running short of oil wears the engine quickly and can ruin it; also find out where the oil is going.",
      applicability: { fuel: COMBUSTION },
    }),
    fm("engine_lubrication", {
      key: "oil_pressure_switch_faulty",
      name: "Oil pressure switch or sender faulty",
      baseRate: 1,
      repairMinutes: 30,
      partsCost: 25,
      priority: "soon",
      description:
        "The switch reads low with good pressure (or leaks oil from its body): the lamp flickers or stays on though a gauge shows normal pressure.",
      ownerDescription:
        "The switch that turns on the oil pressure warning is faulty, so the warning shows when the pressure is fine.",
      ifLeft:
        "A false warning hides a real one; until it is proven false, treat the lamp as real and stop the engine.",
      applicability: { fuel: COMBUSTION, minAgeYears: 6 },
    }),
    fm("engine_lubrication", {
      key: "oil_pump_pickup_blocked",
      name: "Oil pump worn or pick-up strainer blocked",
      baseRate: 0.5,
      repairMinutes: 300,
      partsCost: 150,
      priority: "stop",
      description:
        "Sludge has blocked the pick-up or the pump has worn: low pressure when warm, lifter noise, the lamp at idle. Engine damage follows quickly.",
      ownerDescription:
        "The engine's oil pump is not delivering enough oil, often because its strainer is blocked with sludge.",
      ifLeft:
        "Without enough oil pressure the engine's bearings wear out in minutes to hours. Do not drive it until it is fixed.",
      applicability: { fuel: COMBUSTION, minKm: 150000, youngFactor: 0.2 },
    }),
    fm("engine_lubrication", {
      key: "hydraulic_lifter_noisy",
      name: "Hydraulic lifter or tappet noisy",
      baseRate: 1.5,
      repairMinutes: 240,
      partsCost: 100,
      priority: "watch",
      description:
        "A lifter leaks down or is sticking from old oil: a light tick at the top of the engine, often worst after a cold start.",
      ownerDescription:
        "One of the small parts that open the engine's valves has worn or is sticking, which makes the ticking.",
      ifLeft:
        "The tick may stay the same for a long time; a fresh oil change sometimes quietens it. Badly worn ones can wear the camshaft.",
      applicability: { fuel: COMBUSTION, minKm: 100000, youngFactor: 0.2 },
    }),
    fm("engine_lubrication", {
      key: "engine_bearings_worn",
      name: "Crankshaft main or big-end bearings worn",
      baseRate: 0.4,
      repairMinutes: 900,
      partsCost: 600,
      priority: "stop",
      description:
        "Bearings worn by oil starvation or age: a deep knock that rises with revs and load, low oil pressure when warm. Driving on risks a connecting rod breaking.",
      ownerDescription: "Bearings deep inside the engine have worn, which causes the heavy knocking.",
      ifLeft:
        "The engine can fail completely and suddenly, sometimes breaking its block. It should not be driven.",
      applicability: { fuel: COMBUSTION, minKm: 200000, youngFactor: 0.1 },
    }),
  ],

  checks: [
    {
      key: "oil_level_check",
      name: "Check the engine oil level and condition on the dipstick",
      skill: "apprentice",
      minutes: 5,
      consumablesCost: 0,
      access: ["bonnet_open"],
      cautions: ["hot_parts"],
      instructions: [
        "Follow the vehicle maker's procedure for checking oil: car level, engine off for the time the maker gives; the dipstick is often next to the hot exhaust manifold.",
        "Wipe, reinsert fully and read the level against the marks; note the colour, smell of fuel, metal glitter or sludge.",
      ],
      tools: ["clean cloth", "inspection lamp"],
      result: {
        kind: "pass_fail",
        failMeans: "The oil is below the minimum: top up with the specified oil and find out why it is low.",
      },
      falseAlarm: 0.03,
    },
    {
      key: "oil_pressure_test",
      name: "Measure oil pressure with a gauge in place of the switch",
      skill: "senior",
      minutes: 40,
      consumablesCost: 0,
      access: ["bonnet_open"],
      cautions: ["hot_parts", "exhaust_fumes", "rotating_parts"],
      instructions: [
        SAY.RUNNING +
          " Hot oil can spray when the switch comes out; engine off and gloves on while fitting the gauge.",
        "Remove the pressure switch, fit a mechanical gauge with the right adapter, and run the engine to full working temperature.",
        "Read the pressure at hot idle and at 2000 rpm; use the maker's figures for this engine where they differ from the generic value.",
      ],
      tools: ["oil pressure gauge kit", "exhaust extraction", "gloves"],
      result: {
        kind: "measurement",
        quantity: "pressure at hot idle",
        unit: "bar",
        rule: "value >= 1 bar", // from memory, common practice: many engines hold at least about 1 bar at hot idle; maker-specific — use the maker's figure
        failMeans:
          "Oil pressure is low: check level and grade first, then the pick-up, pump and bearings; the engine should not be driven.",
      },
      falseAlarm: 0.04,
    },
    {
      key: "oil_pressure_switch_test",
      name: "Compare the oil lamp with a gauge reading",
      skill: "technician",
      minutes: 30,
      consumablesCost: 0,
      access: ["bonnet_open"],
      cautions: ["hot_parts", "exhaust_fumes", "rotating_parts"],
      instructions: [
        SAY.RUNNING,
        "With a mechanical gauge fitted alongside or in place of the switch (as the maker's procedure allows), watch the lamp and the gauge at hot idle.",
        "Lamp on with good pressure on the gauge means the switch or its wire is faulty; check the wire for a short to earth too.",
      ],
      tools: ["oil pressure gauge kit", "multimeter", "exhaust extraction"],
      result: {
        kind: "pass_fail",
        failMeans: "The lamp comes on with good pressure: replace the switch or repair its wire.",
      },
      falseAlarm: 0.04,
    },
    {
      key: "timing_belt_inspect",
      name: "Check the timing belt's age by record and inspect it",
      skill: "technician",
      minutes: 20,
      consumablesCost: 0,
      access: ["bonnet_open", "cold_engine"],
      cautions: ["rotating_parts"],
      instructions: [
        "Follow the vehicle maker's procedure; engine off, key away from the car before any cover comes off.",
        "Check the service record and any sticker for the last change, against the maker's interval in years and distance.",
        "Where an inspection cover allows, look at the belt's back and teeth for cracks, fraying, oil and glazing; listen to the tensioner when the engine next runs.",
      ],
      tools: ["inspection lamp", "service record"],
      result: {
        kind: "pass_fail",
        failMeans:
          "The belt is overdue, undocumented or damaged: advise a timing belt kit (with tensioner and, often, water pump).",
      },
      falseAlarm: 0.05,
    },
    {
      key: "timing_chain_check",
      name: "Listen for chain rattle on a cold start and read cam–crank correlation",
      skill: "technician",
      minutes: 20,
      consumablesCost: 0,
      access: ["scan_tool", "bonnet_open", "cold_engine"],
      cautions: ["exhaust_fumes", "rotating_parts"],
      instructions: [
        SAY.RUNNING,
        "Start the engine after it has stood overnight and listen at the timing cover with a stethoscope for a rattle in the first seconds.",
        "Read the cam–crank correlation or cam adaptation values on the scan tool and compare with the maker's limits.",
      ],
      tools: ["stethoscope", "scan tool", "exhaust extraction"],
      result: {
        kind: "pass_fail",
        failMeans: "The chain rattles or the correlation is near its limit: plan a timing chain kit.",
      },
      falseAlarm: 0.06,
    },
    {
      key: "aux_belt_inspect",
      name: "Inspect the auxiliary belt and listen to it running",
      skill: "apprentice",
      minutes: 10,
      consumablesCost: 0,
      access: ["bonnet_open"],
      cautions: ["rotating_parts", "exhaust_fumes"],
      instructions: [
        SAY.RUNNING,
        "Engine off and key away: look along the belt's ribs and back for cracks, missing chunks, glazing and oil; check the tensioner marks are in range.",
        "With the engine running, watch the tensioner arm from a safe distance: it should be steady, not jumping. Never touch a running belt.",
      ],
      tools: ["inspection lamp", "exhaust extraction"],
      result: {
        kind: "pass_fail",
        failMeans:
          "The belt is worn or slipping, or the tensioner jumps: renew the belt (and tensioner if it is weak).",
      },
      falseAlarm: 0.05,
    },
    {
      key: "tensioner_pulley_spin",
      name: "Take the belt off and spin the tensioner and idler pulleys by hand",
      skill: "technician",
      minutes: 20,
      consumablesCost: 0,
      access: ["bonnet_open", "cold_engine"],
      cautions: ["rotating_parts"],
      instructions: [
        "Follow the vehicle maker's procedure; engine off and key away. The tensioner is spring-loaded: use the right tool and keep fingers out of the pulleys while releasing it.",
        "Spin each idler, the tensioner pulley, the alternator and the water pump (where belt-driven): they should turn smoothly and quietly without side play.",
      ],
      tools: ["belt tensioner tool", "stethoscope"],
      result: {
        kind: "pass_fail",
        failMeans: "A pulley is rough or has play: replace that pulley or tensioner (and the belt).",
      },
      falseAlarm: 0.05,
    },
    {
      key: "lifter_noise_listen",
      name: "Pinpoint a top-end tick with a stethoscope",
      skill: "technician",
      minutes: 15,
      consumablesCost: 0,
      access: ["bonnet_open"],
      cautions: ["hot_parts", "exhaust_fumes", "rotating_parts"],
      instructions: [
        SAY.RUNNING + " Keep the probe off the hot exhaust manifold.",
        "At idle, touch the probe along the cam cover over each cylinder, then on the injectors, and the manifold joint, to find where the tick is loudest.",
        "A tick at one valve position that fades as oil pressure builds points to a lifter; an injector or exhaust-manifold tick sounds in the same rhythm but elsewhere.",
      ],
      tools: ["stethoscope", "exhaust extraction"],
      result: {
        kind: "pass_fail",
        failMeans:
          "The tick comes from a lifter or tappet: check oil level and grade, then plan to replace the lifter.",
      },
      falseAlarm: 0.08,
    },
    {
      key: "bottom_end_listen",
      name: "Listen for bottom-end knock and watch oil pressure",
      skill: "senior",
      minutes: 20,
      consumablesCost: 0,
      access: ["bonnet_open", "scan_tool"],
      cautions: ["hot_parts", "exhaust_fumes", "rotating_parts"],
      instructions: [
        SAY.RUNNING + " Keep revs moderate: an engine with worn bearings can fail.",
        "Listen at the block and sump with a stethoscope while blipping the throttle; a deep knock that rises with revs is bottom-end.",
        "Cut each cylinder in turn with the scan tool where offered: a knock that changes when one cylinder is cut points to that big-end.",
      ],
      tools: ["stethoscope", "scan tool", "exhaust extraction"],
      result: {
        kind: "pass_fail",
        failMeans: "The bottom end knocks: the engine's bearings are worn; do not let the car be driven.",
      },
      falseAlarm: 0.04,
    },
  ],

  symptomLinks: [
    ...producesSymptoms("timing_belt_worn", {
      timing_belt_due: 0.8,
      front_engine_whirr: 0.2,
      cranks_no_start: 0.1,
    }),
    ...producesSymptoms("timing_chain_stretched", { rattle_cold_start_timing: 0.8, check_engine_light: 0.5 }),
    ...producesSymptoms("aux_belt_worn", { belt_squeal: 0.8, charge_light: 0.2, heavy_steering: 0.1 }),
    ...producesSymptoms("aux_belt_tensioner_worn", {
      front_engine_whirr: 0.6,
      belt_squeal: 0.5,
      charge_light: 0.1,
    }),
    ...producesSymptoms("oil_level_low", { oil_level_lamp: 0.8, oil_pressure_lamp: 0.4, tick_top_end: 0.3 }),
    ...producesSymptoms("oil_pressure_switch_faulty", { oil_pressure_lamp: 0.8, oil_leak_drips: 0.2 }),
    ...producesSymptoms("oil_pump_pickup_blocked", {
      oil_pressure_lamp: 0.8,
      tick_top_end: 0.5,
      knock_bottom_end: 0.3,
    }),
    ...producesSymptoms("hydraulic_lifter_noisy", { tick_top_end: 0.8, rattle_cold_start_timing: 0.2 }),
    ...producesSymptoms("engine_bearings_worn", { knock_bottom_end: 0.85, oil_pressure_lamp: 0.5 }),
  ],

  checkLinks: [
    ...bearsOn("oil_level_check", { oil_level_low: 0.95 }),
    ...bearsOn("oil_pressure_test", {
      oil_pump_pickup_blocked: 0.85,
      engine_bearings_worn: 0.6,
      oil_level_low: 0.4,
    }),
    ...bearsOn("oil_pressure_switch_test", { oil_pressure_switch_faulty: 0.85 }),
    ...bearsOn("timing_belt_inspect", { timing_belt_worn: 0.85 }),
    ...bearsOn("timing_chain_check", { timing_chain_stretched: 0.8 }),
    ...bearsOn("aux_belt_inspect", { aux_belt_worn: 0.85, aux_belt_tensioner_worn: 0.5 }),
    ...bearsOn("tensioner_pulley_spin", { aux_belt_tensioner_worn: 0.85, water_pump_worn: 0.3 }),
    ...bearsOn("lifter_noise_listen", { hydraulic_lifter_noisy: 0.75 }),
    ...bearsOn("bottom_end_listen", { engine_bearings_worn: 0.8 }),
  ],
};
