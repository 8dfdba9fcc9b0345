// Driveline, part 2: clutch, its hydraulics and pedal, the dual-mass flywheel, and the gearbox
// (oil, selection, synchromesh, bearings, automatic control). The system node is in driveline.ts.
// Manual-only faults use fuel type as a stand-in (no electric car has a clutch); the types cannot
// say "manual gearbox" yet, so the descriptions do.
import { bearsOn, componentNode, failureMode, producesSymptoms, SAY } from "./build";
import type { FuelType, KnowledgeBaseSeed } from "./types";

const fm = (parent: string, f: Parameters<typeof failureMode>[2]) => failureMode("driveline", parent, f);
const sym = { system: "driveline" } as const;
const MANUAL: FuelType[] = ["petrol", "diesel", "lpg"];

export const drivelineClutchGearbox: KnowledgeBaseSeed = {
  symptoms: [
    {
      ...sym,
      key: "clutch_slip",
      name: "Clutch slips: revs rise but the car doesn't speed up",
      kind: "performance",
      synonyms: [
        "clutch slipping",
        "revs flare",
        "loses drive up hills",
        "clutch burning smell",
        "clutch going",
      ],
      conditions: ["accelerating", "high gear", "uphill"],
      leak: 0.01,
    },
    {
      ...sym,
      key: "clutch_judder",
      name: "Judder when pulling away in first or reverse",
      kind: "vibration",
      synonyms: [
        "clutch judder",
        "shudder pulling away",
        "kangaroo when setting off",
        "shakes as the clutch bites",
      ],
      conditions: ["pulling away"],
      leak: 0.03,
    },
    {
      ...sym,
      key: "rattle_idle",
      name: "Rattle from the gearbox end at idle that changes with the clutch",
      kind: "noise",
      synonyms: [
        "rattle at idle",
        "flywheel rattle",
        "marbles in a tin at idle",
        "rattle when switching off",
      ],
      conditions: ["at idle", "switching off"],
      leak: 0.03,
    },
    {
      ...sym,
      key: "clutch_pedal_soft",
      name: "Clutch pedal soft, sinks or stays down",
      kind: "performance",
      synonyms: [
        "clutch pedal goes to the floor",
        "clutch pedal stuck down",
        "spongy clutch",
        "clutch pedal doesn't come back up",
        "no clutch",
      ],
      conditions: ["pressing the clutch"],
      leak: 0.01,
    },
    {
      ...sym,
      key: "clutch_drag_standstill",
      name: "Grinds going into first or reverse at a standstill",
      kind: "noise",
      synonyms: [
        "grinds into reverse",
        "crunches into first when stopped",
        "clutch not disengaging",
        "creeps with the clutch down",
        "hard to get into gear at the lights",
      ],
      conditions: ["at a standstill", "engine running"],
      leak: 0.03,
    }, // some reverse gears without synchromesh grind if selected too quickly
    {
      ...sym,
      key: "crunch_gear_change",
      name: "Crunch when changing gear on the move",
      kind: "noise",
      synonyms: [
        "crunching gears",
        "gearbox crunches",
        "grinds changing into second",
        "baulks changing gear",
        "crunch into third",
      ],
      conditions: ["gear change", "while driving"],
      leak: 0.03,
    },
    {
      ...sym,
      key: "gear_hard_select",
      name: "Gear lever stiff, vague or hard to select gears",
      kind: "performance",
      synonyms: [
        "hard to find gears",
        "sloppy gear lever",
        "gear stick loose",
        "gears hard to select",
        "jumps out of gear",
        "notchy gear change",
      ],
      conditions: ["gear change"],
      leak: 0.03,
    },
    {
      ...sym,
      key: "noise_clutch_pedal",
      name: "Noise that comes or goes when the clutch pedal is pressed",
      kind: "noise",
      synonyms: [
        "whirr when I press the clutch",
        "chirp from the clutch",
        "noise stops when I press the clutch",
        "release bearing noise",
        "rumble in neutral",
      ],
      conditions: ["at idle", "pressing the clutch"],
      leak: 0.03,
    },
    {
      ...sym,
      key: "pedal_squeak",
      name: "Squeak or creak from the clutch pedal",
      kind: "noise",
      synonyms: ["clutch pedal squeaks", "creaky clutch", "clutch pedal clicks", "squeaking pedal"],
      conditions: ["pressing the clutch"],
      leak: 0.03,
    },
    {
      ...sym,
      key: "gearbox_whine",
      name: "Whine from the gearbox that changes with the gear selected",
      kind: "noise",
      synonyms: [
        "gearbox whine",
        "whine in third gear",
        "gearbox noisy",
        "howl in some gears",
        "whine on the overrun",
      ],
      conditions: ["in gear", "accelerating", "on the overrun"],
      leak: 0.04,
    },
    {
      ...sym,
      key: "gearbox_oil_leak",
      name: "Oil leak between the engine and the gearbox",
      kind: "leak",
      synonyms: [
        "oil drip from the gearbox",
        "gearbox leaking",
        "oil from the bell housing",
        "oil under the middle of the engine",
      ],
      conditions: ["parked", "on the ramp"],
      leak: 0.02,
    },
    {
      ...sym,
      key: "auto_gearbox_harsh",
      name: "Automatic gearbox shifts harshly, slips or holds one gear",
      kind: "performance",
      synonyms: [
        "automatic jerks when changing gear",
        "harsh gear change",
        "gearbox slipping",
        "stuck in third",
        "gearbox limp mode",
        "jerking when it changes gear",
        "delayed engagement into drive",
      ],
      conditions: ["gear change", "pulling away", "warm engine"],
      leak: 0.03,
    },
  ],

  causes: [
    componentNode(
      "driveline",
      "clutch_flywheel",
      "Clutch and flywheel",
      "Friction plate, pressure plate, release bearing, clutch hydraulics and pedal, and flywheel on manual cars.",
    ),
    componentNode(
      "driveline",
      "driveline_gearbox",
      "Gearbox",
      "Gearbox oil, gear selection, synchromesh and bearings; for automatics, their fluid and control.",
    ),
    fm("clutch_flywheel", {
      key: "clutch_worn",
      name: "Clutch friction plate worn (slipping)",
      baseRate: 3,
      repairMinutes: 300,
      partsCost: 250,
      priority: "soon",
      description:
        "The plate is worn thin or oil-soaked and slips under load; it will get worse until the car will not move. Manual gearboxes only.",
      ownerDescription:
        "The clutch has worn out, so the engine's power slips instead of reaching the wheels.",
      ifLeft: "It slips more and more until the car will not pull away, usually at an awkward moment.",
      applicability: { fuel: MANUAL, minKm: 100000, youngFactor: 0.2 },
    }),
    fm("clutch_flywheel", {
      key: "dual_mass_flywheel",
      name: "Dual-mass flywheel worn",
      baseRate: 1.5,
      repairMinutes: 330,
      partsCost: 500,
      priority: "soon",
      description:
        "The sprung two-part flywheel has worn its springs or bearing: rattle at idle and on switch-off, judder pulling away. Manual gearboxes with a dual-mass flywheel only.",
      ownerDescription:
        "The two-part flywheel between the engine and the clutch has worn inside, which causes the rattle.",
      ifLeft:
        "The rattle and judder get worse, and a flywheel that breaks up can damage the clutch and gearbox housing.",
      applicability: { fuel: ["petrol", "diesel"], minKm: 120000, youngFactor: 0.2 },
    }),
    fm("clutch_flywheel", {
      key: "clutch_release_bearing",
      name: "Clutch release bearing worn",
      baseRate: 1.5,
      repairMinutes: 300,
      partsCost: 120,
      priority: "watch",
      description:
        "The bearing that presses on the clutch fingers is dry or rough: a whirr or chirp when the pedal is pressed. Manual gearboxes only; usually changed with the clutch.",
      ownerDescription:
        "The bearing that works the clutch when you press the pedal has worn, which makes the whirring noise.",
      ifLeft: "The noise grows; in the end the bearing can fail and the clutch stops releasing properly.",
      applicability: { fuel: MANUAL, minKm: 100000, youngFactor: 0.2 },
    }),
    fm("clutch_flywheel", {
      key: "clutch_hydraulic_leak",
      name: "Clutch master or slave cylinder leaking or bypassing",
      baseRate: 1.5,
      repairMinutes: 120,
      partsCost: 90,
      priority: "soon",
      description:
        "Fluid leaks at the pedal-end or gearbox-end cylinder, or the seals bypass: soft or sinking pedal, clutch that will not free, grinding into gear. Many cars share the brake fluid reservoir. Manual gearboxes with hydraulic clutch only.",
      ownerDescription: "The hydraulic parts that work the clutch are leaking fluid or worn inside.",
      ifLeft:
        "The clutch can stop working suddenly, so you cannot change gear; if it shares fluid with the brakes, that level drops too.",
      applicability: { fuel: MANUAL, minAgeYears: 6 },
    }),
    fm("clutch_flywheel", {
      key: "clutch_pedal_mechanism",
      name: "Clutch pedal pivot, spring or cable worn",
      baseRate: 1,
      repairMinutes: 60,
      partsCost: 40,
      priority: "watch",
      description:
        "A dry or worn pedal pivot bush, a broken over-centre spring or a fraying cable: squeak or creak, a pedal that sticks low or feels uneven. Manual gearboxes only.",
      ownerDescription:
        "The clutch pedal's pivot or spring has worn, so it squeaks or does not return smoothly.",
      ifLeft: "It keeps squeaking and can get stiffer; a cable that snaps leaves the clutch unusable.",
      applicability: { fuel: MANUAL, minKm: 80000, youngFactor: 0.3 },
    }),
    fm("driveline_gearbox", {
      key: "gearbox_oil_low",
      name: "Manual gearbox oil low or leaking",
      baseRate: 1,
      repairMinutes: 45,
      partsCost: 30,
      priority: "soon",
      description:
        "Oil lost from a driveshaft seal, selector seal or casing joint: whine, baulky changes and, in time, bearing damage. Manual gearboxes only.",
      ownerDescription: "The gearbox has lost some of its oil through a leaking seal.",
      ifLeft: "Without enough oil the gearbox wears quickly and can fail, which is a very large bill.",
      applicability: { fuel: MANUAL, minAgeYears: 6 },
    }),
    fm("driveline_gearbox", {
      key: "gear_linkage_worn",
      name: "Gear linkage cables or bushes worn",
      baseRate: 1.5,
      repairMinutes: 75,
      partsCost: 60,
      priority: "soon",
      description:
        "Worn bushes at the lever or gearbox end, or stretched selector cables: a sloppy lever, gears hard to find, jumping out of gear. Manual gearboxes only.",
      ownerDescription:
        "The parts that connect the gear lever to the gearbox have worn, so gears are hard to find.",
      ifLeft: "Gear selection gets worse and the car can jump out of gear or get stuck in one.",
      applicability: { fuel: MANUAL, minKm: 100000, youngFactor: 0.3 },
    }),
    fm("driveline_gearbox", {
      key: "synchro_worn",
      name: "Gearbox synchromesh worn",
      baseRate: 1,
      repairMinutes: 600,
      partsCost: 300,
      priority: "watch",
      description:
        "The cone rings that match gear speeds have worn: a crunch into one or two gears on quick changes, better with a slow change. Manual gearboxes only.",
      ownerDescription:
        "Parts inside the gearbox that make gear changes smooth have worn, so some gears crunch.",
      ifLeft: "The crunch gets worse and the gear teeth wear; slowing the gear change helps meanwhile.",
      applicability: { fuel: MANUAL, minKm: 150000, youngFactor: 0.2 },
    }),
    fm("driveline_gearbox", {
      key: "gearbox_bearing_worn",
      name: "Gearbox bearing worn",
      baseRate: 0.8,
      repairMinutes: 600,
      partsCost: 350,
      priority: "soon",
      description:
        "An input or output shaft bearing has worn: a rumble in neutral that goes when the clutch is pressed (input shaft), or a whine in gear under load.",
      ownerDescription: "A bearing inside the gearbox has worn, which causes the whine or rumble.",
      ifLeft:
        "The noise grows and the bearing can fail, damaging gears; that means a gearbox rebuild or replacement.",
      applicability: { minKm: 150000, youngFactor: 0.2 },
    }),
    fm("driveline_gearbox", {
      key: "auto_gearbox_fault",
      name: "Automatic gearbox fluid or control fault",
      baseRate: 1.5,
      repairMinutes: 180,
      partsCost: 250,
      priority: "soon",
      description:
        "Old or low fluid, a sticking solenoid or valve, or a control fault: harsh or late shifts, slipping, limp mode holding one gear, often with the engine lamp on (P0700 requests the lamp). Automatic gearboxes only.",
      ownerDescription:
        "The automatic gearbox has a fault in its fluid or in the parts that control the gear changes.",
      ifLeft:
        "The changes get worse and internal wear speeds up; a gearbox left slipping can be damaged beyond repair.",
      applicability: { minKm: 100000, youngFactor: 0.3 },
    }),
  ],

  checks: [
    {
      key: "clutch_slip_test",
      name: "Clutch slip test on the road in a high gear",
      skill: "technician",
      minutes: 10,
      consumablesCost: 0,
      access: ["road_test"],
      cautions: [],
      instructions: [
        "On a clear road at about 50 km/h in the highest gear but one, press the throttle fully for a few seconds.",
        "Watch the rev counter: revs that rise faster than road speed mean the clutch is slipping.",
        "Do not repeat many times; a slipping clutch overheats.",
      ],
      tools: [],
      result: {
        kind: "pass_fail",
        failMeans: "The clutch slips under load: it needs replacing; look for an oil leak onto it.",
      },
      falseAlarm: 0.04,
    },
    {
      key: "clutch_pedal_feel",
      name: "Check clutch pedal feel, return and bite point",
      skill: "apprentice",
      minutes: 5,
      consumablesCost: 0,
      access: [],
      cautions: [],
      instructions: [
        "Engine off: press the clutch pedal slowly to the floor and let it up; it should move smoothly, feel even and return fully on its own.",
        "Note a soft or sinking pedal, a squeak or click, and a pedal that stays down or comes back slowly.",
      ],
      tools: [],
      result: {
        kind: "pass_fail",
        failMeans:
          "The pedal is soft, sticks or is noisy: look at the clutch hydraulics, the pedal pivot and spring, or the cable.",
      },
      falseAlarm: 0.05,
    },
    {
      key: "clutch_drag_test",
      name: "Clutch drag test: select reverse with the pedal held down",
      skill: "technician",
      minutes: 5,
      consumablesCost: 0,
      access: [],
      cautions: ["exhaust_fumes"],
      instructions: [
        SAY.FUMES + " Parking brake on, nobody in front of or behind the car.",
        "With the engine idling and the pedal fully down, wait five seconds and select reverse slowly: it should go in quietly.",
        "With the pedal down in first, the car should not try to creep against the brakes.",
      ],
      tools: ["exhaust extraction"],
      result: {
        kind: "pass_fail",
        failMeans:
          "The clutch does not free fully: check the fluid and hydraulics or cable first, then the clutch plate itself.",
      },
      falseAlarm: 0.06,
    },
    {
      key: "clutch_hydraulic_inspect",
      name: "Inspect the clutch master and slave cylinders and fluid",
      skill: "technician",
      minutes: 20,
      consumablesCost: 0,
      access: ["ramp", "bonnet_open"],
      cautions: ["lifting", "brake_hydraulics"],
      instructions: [
        SAY.LIFT,
        SAY.BRAKE_FLUID + " Many clutches share the brake fluid reservoir.",
        "Check the reservoir level; look for fluid behind the pedal box (master cylinder) and at the slave cylinder on the gearbox, including damp carpet under the pedals.",
        "Watch the slave cylinder push rod while a helper presses the pedal: it should move fully and hold.",
      ],
      tools: ["inspection lamp", "gloves", "safety glasses"],
      result: {
        kind: "pass_fail",
        failMeans:
          "A clutch cylinder leaks or the push rod does not move fully: replace the cylinder and bleed the clutch.",
      },
      falseAlarm: 0.05,
    },
    {
      key: "pedal_mechanism_inspect",
      name: "Inspect the clutch pedal pivot, spring and cable",
      skill: "technician",
      minutes: 20,
      consumablesCost: 2,
      access: [],
      cautions: [],
      instructions: [
        "With a lamp under the dashboard, work the clutch pedal and watch the pivot, over-centre spring and cable or push rod.",
        "A dry or worn pivot bush, a broken spring, a fraying cable or a cracked pedal bracket is a fail. Grease only where the maker allows.",
      ],
      tools: ["inspection lamp"],
      result: {
        kind: "pass_fail",
        failMeans: "The pedal mechanism is worn or broken: repair the pivot, spring or cable.",
      },
      falseAlarm: 0.05,
    },
    {
      key: "release_bearing_listen",
      name: "Listen at the bell housing with the clutch pressed and released",
      skill: "technician",
      minutes: 10,
      consumablesCost: 0,
      access: ["bonnet_open"],
      cautions: ["rotating_parts", "exhaust_fumes"],
      instructions: [
        SAY.RUNNING,
        "At warm idle in neutral, listen at the bell housing with the pedal up, then held down, then just touched.",
        "A noise that starts when the pedal is pressed is the release bearing; a rumble in neutral that stops when it is pressed is the gearbox input bearing.",
      ],
      tools: ["stethoscope", "exhaust extraction"],
      result: {
        kind: "pass_fail",
        failMeans: "The release bearing or gearbox input bearing is noisy: plan a clutch or gearbox repair.",
      },
      falseAlarm: 0.08,
    },
    {
      key: "flywheel_rattle_listen",
      name: "Listen for flywheel rattle at idle and on switch-off",
      skill: "technician",
      minutes: 10,
      consumablesCost: 0,
      access: ["bonnet_open"],
      cautions: ["rotating_parts", "exhaust_fumes"],
      instructions: [
        SAY.RUNNING,
        "At warm idle in neutral, listen at the bell housing; press and release the clutch and note any change.",
        "Switch off and listen for a clatter as the engine stops; compare with the behaviour the maker describes for this flywheel.",
      ],
      tools: ["stethoscope", "exhaust extraction"],
      result: {
        kind: "pass_fail",
        failMeans:
          "A flywheel rattle is present: the dual-mass flywheel is suspect; confirm with the maker's test before the gearbox comes out.",
      },
      falseAlarm: 0.12,
    },
    {
      key: "gearbox_oil_level",
      name: "Check manual gearbox oil level at the filler plug",
      skill: "technician",
      minutes: 20,
      consumablesCost: 5,
      access: ["ramp"],
      cautions: ["lifting", "hot_parts"],
      instructions: [
        SAY.LIFT +
          " With the car level on the ramp; gearbox oil and the exhaust can be hot after a road test, let them cool or wear gloves.",
        "Remove the filler or level plug (never the drain plug first) and check the oil is at the hole, or as the maker's procedure describes.",
        "Look for leaks at the driveshaft seals, selector shaft and casing joints, and at the bell housing drain hole.",
      ],
      tools: ["plug spanners", "oil tray", "gloves", "inspection lamp"],
      result: {
        kind: "pass_fail",
        failMeans: "The gearbox oil is low: find and repair the leak, refill with the specified oil.",
      },
      falseAlarm: 0.05,
    },
    {
      key: "gear_linkage_inspect",
      name: "Inspect the gear linkage at the lever and at the gearbox",
      skill: "technician",
      minutes: 15,
      consumablesCost: 0,
      access: ["bonnet_open"],
      cautions: [],
      instructions: [
        "Engine off, parking brake on: move the gear lever through every gear and feel for slop and tight spots.",
        "Under the bonnet, watch the cables or rods and their bushes at the gearbox while a helper moves the lever; look for split bushes and loose clips.",
      ],
      tools: ["inspection lamp"],
      result: {
        kind: "pass_fail",
        failMeans: "A linkage bush or cable is worn or loose: replace it and adjust the linkage.",
      },
      falseAlarm: 0.05,
    },
    {
      key: "gearbox_road_test",
      name: "Road test every gear change, up and down, and listen in each gear",
      skill: "technician",
      minutes: 15,
      consumablesCost: 0,
      access: ["road_test"],
      cautions: [],
      instructions: [
        "Change up and down through every gear, first at a normal pace, then quickly; note crunches, baulking and a lever that jumps out.",
        "Hold each gear under light load and on the overrun and listen for a whine that belongs to that gear only.",
        "On automatics, note harsh, late or slipping changes and whether the gearbox holds one gear.",
      ],
      tools: [],
      result: {
        kind: "pass_fail",
        failMeans:
          "A gear crunches, whines or will not stay in, or the automatic shifts badly: the pattern points to synchromesh, bearings, oil or control.",
      },
      falseAlarm: 0.08,
    },
    {
      key: "auto_gearbox_scan",
      name: "Read the gearbox fault memory, check fluid temperature and level",
      skill: "senior",
      minutes: 30,
      consumablesCost: 0,
      access: ["scan_tool", "ramp"],
      cautions: ["lifting", "hot_parts", "exhaust_fumes"],
      instructions: [
        SAY.FUMES + " " + SAY.LIFT,
        "Read the gearbox control unit's faults and adaptation data; note P0700 in the engine memory as a pointer to them.",
        "Check the fluid at the temperature the maker's procedure gives (the fluid and exhaust are hot) and look at its colour and smell: dark, burnt fluid or debris is a fail.",
      ],
      tools: ["scan tool", "infrared thermometer", "gloves"],
      result: {
        kind: "pass_fail",
        failMeans:
          "The gearbox stores a fault or its fluid is low or burnt: correct the fluid and follow the stored fault.",
      },
      falseAlarm: 0.06,
    },
  ],

  symptomLinks: [
    ...producesSymptoms("clutch_worn", { clutch_slip: 0.9, clutch_judder: 0.3, high_fuel_consumption: 0.1 }),
    ...producesSymptoms("dual_mass_flywheel", {
      rattle_idle: 0.7,
      clutch_judder: 0.5,
      clunk_takeoff: 0.3,
      engine_shake_idle: 0.3,
    }),
    ...producesSymptoms("clutch_release_bearing", {
      noise_clutch_pedal: 0.8,
      clutch_drag_standstill: 0.1,
      rattle_idle: 0.1,
    }),
    ...producesSymptoms("clutch_hydraulic_leak", {
      clutch_pedal_soft: 0.85,
      clutch_drag_standstill: 0.6,
      gear_hard_select: 0.4,
      brake_fluid_low: 0.2,
    }),
    ...producesSymptoms("clutch_pedal_mechanism", {
      pedal_squeak: 0.8,
      clutch_pedal_soft: 0.3,
      clutch_drag_standstill: 0.1,
    }),
    ...producesSymptoms("gearbox_oil_low", {
      gearbox_whine: 0.6,
      crunch_gear_change: 0.4,
      gearbox_oil_leak: 0.7,
      gear_hard_select: 0.2,
    }),
    ...producesSymptoms("gear_linkage_worn", { gear_hard_select: 0.8, crunch_gear_change: 0.2 }),
    ...producesSymptoms("synchro_worn", { crunch_gear_change: 0.85, gear_hard_select: 0.3 }),
    ...producesSymptoms("gearbox_bearing_worn", {
      gearbox_whine: 0.7,
      noise_clutch_pedal: 0.5,
      whine_road_speed: 0.2,
    }),
    ...producesSymptoms("auto_gearbox_fault", {
      auto_gearbox_harsh: 0.85,
      check_engine_light: 0.3,
      loss_of_power: 0.2,
    }),
  ],

  checkLinks: [
    ...bearsOn("clutch_slip_test", { clutch_worn: 0.9 }),
    ...bearsOn("clutch_pedal_feel", { clutch_hydraulic_leak: 0.7, clutch_pedal_mechanism: 0.7 }),
    ...bearsOn("clutch_drag_test", {
      clutch_hydraulic_leak: 0.7,
      clutch_worn: 0.2,
      clutch_pedal_mechanism: 0.2,
    }),
    ...bearsOn("clutch_hydraulic_inspect", { clutch_hydraulic_leak: 0.85 }),
    ...bearsOn("pedal_mechanism_inspect", { clutch_pedal_mechanism: 0.85 }),
    ...bearsOn("release_bearing_listen", { clutch_release_bearing: 0.8, gearbox_bearing_worn: 0.5 }),
    ...bearsOn("flywheel_rattle_listen", { dual_mass_flywheel: 0.7 }),
    ...bearsOn("gearbox_oil_level", { gearbox_oil_low: 0.9 }),
    ...bearsOn("gear_linkage_inspect", { gear_linkage_worn: 0.85, gearbox_mount_worn: 0.2 }),
    ...bearsOn("gearbox_road_test", { driveline_gearbox: 0.6 }),
    ...bearsOn("auto_gearbox_scan", { auto_gearbox_fault: 0.85 }),
  ],
};
