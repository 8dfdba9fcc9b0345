// Brakes, part 1: discs, pads and their fit in the carrier, calipers and slide pins, and the noises
// of the brake area that are not wear. Part 2 (hydraulics, ABS, parking brake) is brakes-hydraulics.ts.
import { bearsOn, componentNode, failureMode, producesSymptoms, SAY, systemNode, gradedOn } from "./build";
import type { KnowledgeBaseSeed } from "./types";

const fm = (parent: string, f: Parameters<typeof failureMode>[2]) => failureMode("brakes", parent, f);
const sym = { system: "brakes" } as const;

export const brakes: KnowledgeBaseSeed = {
  symptoms: [
    {
      ...sym,
      key: "vibration_braking",
      name: "Vibration through the steering wheel under braking",
      kind: "vibration",
      synonyms: [
        "judder when braking",
        "brake judder",
        "shudder when braking",
        "shake when I brake",
        "shakes when I brake",
        "steering wheel shakes when braking",
        "wobble when braking",
        "warped discs",
        "warped rotors",
      ],
      conditions: ["under braking", "from speed"],
      leak: 0.03,
    },
    {
      ...sym,
      key: "pedal_pulsing",
      name: "Pulsing brake pedal under normal braking",
      kind: "vibration",
      synonyms: ["pedal pulses", "pedal judder", "pedal vibrates", "brake pedal kicks back", "pedal throbs"],
      conditions: ["under braking"],
      leak: 0.03,
    },
    {
      ...sym,
      key: "squeal_braking",
      name: "Squeal when braking",
      kind: "noise",
      synonyms: [
        "squeak when braking",
        "squealing brakes",
        "screech when stopping",
        "high-pitched noise when braking",
        "squeal",
      ],
      conditions: ["under braking", "low speed"],
      leak: 0.05,
    },
    {
      ...sym,
      key: "grinding_braking",
      name: "Grinding when braking",
      kind: "noise",
      synonyms: [
        "grinding brakes",
        "metal on metal",
        "scraping when braking",
        "growl when braking",
        "grinding noise",
      ],
      conditions: ["under braking"],
      leak: 0.02,
    },
    {
      ...sym,
      key: "scrape_while_driving",
      name: "Scraping or grating from a wheel while driving, brakes off",
      kind: "noise",
      synonyms: [
        "scraping noise from the wheel",
        "metallic scrape that comes and goes",
        "grating noise when driving",
        "tinny scraping from the front",
        "noise stops when I brake",
      ],
      conditions: ["while driving", "low speed", "after a gravel road"],
      leak: 0.03,
    },
    {
      ...sym,
      key: "rattle_wheel_rough_roads",
      name: "Light rattle from a wheel over rough roads that stops when braking",
      kind: "noise",
      synonyms: [
        "rattle from the wheel",
        "brakes rattle",
        "tinny rattle over cobbles",
        "loose pads rattling",
        "clicking over bumps that goes when I brake",
      ],
      conditions: ["over rough roads", "low speed"],
      leak: 0.04,
    },
    {
      ...sym,
      key: "knock_brake_apply",
      name: "Clunk from a front wheel when the brakes first bite or on reversing",
      kind: "noise",
      synonyms: [
        "clunk when I brake",
        "knock when braking",
        "clonk when reversing and braking",
        "thud from the wheel when stopping",
        "brakes clunk",
      ],
      conditions: ["under braking", "reversing"],
      leak: 0.03,
    },
    {
      ...sym,
      key: "pad_wear_uneven",
      name: "Pads worn unevenly or tapered",
      kind: "visible",
      synonyms: [
        "inner pad worn more",
        "tapered pads",
        "one pad worn down",
        "uneven pad wear",
        "pads worn on a slant",
      ],
      conditions: ["at a service"],
      leak: 0.03,
    },
    {
      ...sym,
      key: "hot_wheel_smell",
      name: "Hot brake smell or one wheel hot after a drive",
      kind: "smell",
      synonyms: [
        "burning smell from a wheel",
        "brakes smell hot",
        "one wheel very hot",
        "brakes dragging",
        "binding brake",
      ],
      conditions: ["after driving"],
      leak: 0.03,
    },
  ],

  causes: [
    systemNode("brakes", "Brakes", "Service brake, parking brake and anti-lock sensing."),
    componentNode(
      "brakes",
      "brakes_friction",
      "Brake discs and pads",
      "The rubbing parts at each wheel: pads, discs, dust shields and the pad fittings in the carrier.",
    ),
    componentNode(
      "brakes",
      "brakes_calipers",
      "Brake calipers",
      "Caliper pistons, seals, slide pins and the bolts that hold the caliper and carrier.",
    ),
    fm("brakes_friction", {
      key: "brake_pads_worn",
      name: "Brake pads worn near the limit",
      baseRate: 10,
      repairMinutes: 60,
      partsCost: 45,
      priority: "soon",
      description:
        "Friction material worn down to where replacement is due; the wear indicator may be squealing.",
      ownerDescription: "The brake pads have worn down through normal use and are close to needing new ones.",
      ifLeft:
        "They keep wearing until metal rubs on the disc, which costs a new disc too and makes braking weaker.",
      applicability: { minKm: 25000, youngFactor: 0.3 },
    }),
    fm("brakes_friction", {
      key: "brake_pads_metal",
      name: "Brake pads worn to the backing plate",
      baseRate: 2.5,
      repairMinutes: 90,
      partsCost: 140,
      priority: "stop",
      description:
        "No friction material left: steel on disc, braking much weaker and the disc is being cut. Not safe to drive.",
      ownerDescription: "The pads have worn right through, so bare metal is pressing on the disc.",
      ifLeft:
        "The car stops much less well and the discs are being damaged every time you brake. It should not be driven until new pads and discs are fitted.",
      applicability: { minKm: 40000, youngFactor: 0.2 },
    }),
    fm("brakes_friction", {
      key: "brake_disc_runout_dtv",
      name: 'Front disc thickness variation or excessive lateral run-out ("warped disc")',
      baseRate: 6,
      repairMinutes: 90,
      partsCost: 110,
      priority: "soon",
      description:
        "The disc wobbles as it turns or has worn thicker and thinner round its face, so the pads push back in pulses. Owners call it a warped disc; usually it is run-out from a poorly seated disc or hub that has worn into thickness variation.",
      ownerDescription:
        "The brake discs at the front have worn unevenly, so the brakes grab and release as the wheel turns.",
      ifLeft:
        "Braking gets less smooth and the pads wear faster; it is not dangerous today but will get worse.",
      applicability: { minKm: 20000, youngFactor: 0.4 },
    }),
    fm("brakes_friction", {
      key: "brake_pad_deposits",
      name: "Uneven pad-material transfer on the disc face",
      baseRate: 3,
      repairMinutes: 60,
      partsCost: 45,
      priority: "watch",
      description:
        "Patches of pad material baked onto the disc (often after holding the brake on hot discs) grip unevenly and give a judder before any real thickness variation appears.",
      ownerDescription: "Patches of pad material have stuck to the brake discs, so the pads grip unevenly.",
      ifLeft: "The judder usually grows and can turn into uneven disc wear, which means new discs.",
    }),
    fm("brakes_friction", {
      key: "brake_disc_corrosion",
      name: "Disc face corroded or scored after standing",
      baseRate: 3,
      repairMinutes: 90,
      partsCost: 100,
      priority: "watch",
      description:
        "Rust bands or deep scoring on the swept face, common on rear discs of cars that stand or do short trips; grinds and brakes unevenly.",
      ownerDescription:
        "Rust and grooves have formed on the brake discs, usually because the car stands a lot or does short trips.",
      ifLeft:
        "The brakes grind and work less evenly, and the pads wear faster; the discs will need replacing.",
    }),
    fm("brakes_friction", {
      key: "brake_pad_noise",
      name: "Pad vibration from missing shims, dry slides or glazed pads",
      baseRate: 4,
      repairMinutes: 45,
      partsCost: 35,
      priority: "watch",
      description:
        "The pad sings against the disc because anti-noise shims are missing, contact points are dry or the surface has glazed. Brakes still work normally.",
      ownerDescription:
        "The brakes squeal because the pads are vibrating in their fittings; they still stop the car normally.",
      ifLeft: "Nothing dangerous happens, but the noise stays and tends to get worse.",
    }),
    fm("brakes_friction", {
      key: "brake_disc_worn_thin",
      name: "Disc worn below its minimum thickness",
      baseRate: 3,
      repairMinutes: 90,
      partsCost: 110,
      priority: "soon",
      description:
        "The disc has worn under the minimum stamped on it, usually with a raised lip at the edge; it holds less heat and can crack or fade on a long descent.",
      ownerDescription: "The brake discs have worn thinner than their makers allow.",
      ifLeft:
        "Thin discs get hotter and can lose braking on long hills; new pads will not bed in properly until the discs are replaced.",
      applicability: { minKm: 60000, youngFactor: 0.2 },
    }),
    fm("brakes_friction", {
      key: "brake_pad_carrier_rattle",
      name: "Pads loose in a worn caliper carrier (rattle)",
      baseRate: 2,
      repairMinutes: 60,
      partsCost: 60,
      priority: "soon",
      description:
        "The pad ears have worn steps into the carrier abutments, or the anti-rattle clips are missing or rusted thin: the pads rattle over rough roads, knock on brake application and can stick.",
      ownerDescription:
        "The brake pads have worn a loose fit in the bracket that holds them, so they rattle over bumps.",
      ifLeft:
        "The rattle gets louder and the pads can start to stick or wear unevenly; braking itself is not affected yet.",
      applicability: { minKm: 60000, youngFactor: 0.3 },
    }),
    fm("brakes_friction", {
      key: "stone_in_brake_shield",
      name: "Stone trapped between the disc and its dust shield",
      baseRate: 1.5,
      repairMinutes: 20,
      partsCost: 0,
      priority: "watch",
      description:
        "A small stone from a gravel road is caught between the dust shield and the disc: a loud metallic scrape that comes and goes and often stops under braking, scoring a ring into the disc.",
      ownerDescription: "A small stone is caught behind the brake disc and is scraping against it.",
      ifLeft: "It can cut a groove into the disc; usually it is a quick fix and nothing else is wrong.",
    }),
    fm("brakes_friction", {
      key: "dust_shield_touching",
      name: "Corroded or bent dust shield touching the disc",
      baseRate: 2,
      repairMinutes: 30,
      partsCost: 25,
      priority: "watch",
      description:
        "The thin shield behind the disc has rusted loose or been bent (often after a tyre or brake job) and rubs the disc: a tinny scrape at low speed that changes over bumps.",
      ownerDescription:
        "The thin metal cover behind the brake disc has rusted or been knocked, and now rubs on the disc.",
      ifLeft: "The scrape continues and the cover can break up further; it does not stop the brakes working.",
      applicability: { minAgeYears: 5 },
    }),
    fm("brakes_calipers", {
      key: "brake_caliper_sticking",
      name: "Caliper piston or slide pins sticking",
      baseRate: 3,
      repairMinutes: 90,
      partsCost: 120,
      priority: "soon",
      description:
        "The caliper does not release fully: the wheel drags, gets hot, wears its pads fast and the car pulls or uses more fuel.",
      ownerDescription:
        "One brake is not letting go fully after you take your foot off the pedal, so it keeps rubbing.",
      ifLeft:
        "That brake overheats and wears out quickly, the car pulls and uses more fuel; a very hot brake can fade.",
      applicability: { minAgeYears: 5 },
    }),
    fm("brakes_calipers", {
      key: "caliper_bolt_loose",
      name: "Caliper or carrier bolt loose",
      baseRate: 0.5,
      repairMinutes: 30,
      partsCost: 10,
      priority: "stop",
      description:
        "A guide bolt or carrier bolt was not tightened after work or has backed out: a clunk as the brakes bite or on reversing, and the caliper can jam in the wheel. Not safe to drive.",
      ownerDescription: "A bolt holding the brake on one wheel is loose.",
      ifLeft:
        "The brake can move, jam against the wheel or stop working on that corner. The car should not be driven until it is tightened and checked.",
    }),
    fm("brakes_calipers", {
      key: "slide_pins_worn",
      name: "Caliper slide pins worn or their boots split",
      baseRate: 2,
      repairMinutes: 60,
      partsCost: 30,
      priority: "soon",
      description:
        "Worn or dry pins let the caliper rock and knock; split boots let water in so the pins corrode and the pads wear tapered.",
      ownerDescription:
        "The pins the brake slides on have worn or lost their rubber covers, so the brake knocks and wears unevenly.",
      ifLeft: "The pins will start to stick, the pads wear on a slant and the brake can begin to drag.",
      applicability: { minAgeYears: 4 },
    }),
  ],

  checks: [
    {
      key: "brake_road_test",
      name: "Road test the brakes from speed",
      skill: "technician",
      minutes: 15,
      consumablesCost: 0,
      access: ["road_test"],
      cautions: [],
      instructions: [
        "Choose a quiet road with room to stop; check the pedal feels firm before moving off.",
        "Brake gently from about 80 km/h, then firmly from about 50 km/h, hands light on the wheel.",
        "Note judder through the wheel or pedal, any pull, and squeal or grinding, and whether they change once the brakes are warm.",
        "Do a few low-speed stops with the window down to place noises front or rear and left or right.",
      ],
      tools: ["trade plates if required"],
      result: {
        kind: "pass_fail",
        failMeans:
          "The brakes judder, pull, make noise or the pedal feels wrong: one of the brake faults is present; the finding narrows which.",
      },
      falseAlarm: 0.08,
    },
    {
      key: "brake_noise_low_speed",
      name: "Low-speed road test for brake-area rattles and scrapes",
      skill: "technician",
      minutes: 10,
      consumablesCost: 0,
      access: ["road_test"],
      cautions: [],
      instructions: [
        "With the windows down and the radio off, drive slowly over a rough surface, first coasting, then with the brake pedal lightly pressed.",
        "A rattle that stops the moment the pedal is touched points to pads loose in the carrier; a scrape that comes and goes with wheel speed points to a stone or the dust shield.",
        "Brake to a stop going forwards and then in reverse: a single clunk as the brakes bite points to a loose caliper or carrier bolt.",
      ],
      tools: [],
      result: {
        kind: "pass_fail",
        failMeans:
          "A rattle, scrape or clunk comes from the brake area: inspect that wheel's pads, carrier, bolts and dust shield.",
      },
      falseAlarm: 0.1,
    },
    {
      key: "disc_runout_dial_gauge",
      name: "Measure front disc lateral run-out with a dial gauge",
      skill: "technician",
      minutes: 25,
      consumablesCost: 0,
      access: ["ramp", "wheels_off"],
      cautions: ["lifting"],
      instructions: [
        SAY.LIFT,
        "Remove the front wheel. Refit the wheel nuts or bolts with flat spacers so the disc is clamped to the hub at the maker's torque.",
        "Fix the dial gauge base to the steering knuckle; set the probe square to the disc face about 10 mm in from the outer edge of the swept area.",
        "Turn the hub slowly one full turn and read the total swing of the needle (highest minus lowest).",
        "If over the limit, index the disc to another stud position and re-measure, then measure the hub face alone to tell disc from hub.",
        "Use the maker's run-out figure for this vehicle where it differs from the generic limit.",
      ],
      tools: ["dial gauge with magnetic base", "wheel-nut spacers", "torque wrench"],
      result: {
        kind: "measurement",
        quantity: "length",
        unit: "mm",
        rule: "value <= 0.05 mm", // common practice, no published source: limits are typically 0.03–0.13 mm and maker-specific — use the maker's figure
        failMeans:
          "The disc wobbles more than allowed. Clean and re-seat it, check the hub face; if it stays over, replace or skim the disc and fit new pads.",
      },
      falseAlarm: 0.05,
    },
    {
      key: "disc_thickness_variation",
      name: "Measure front disc thickness variation with a micrometer",
      skill: "technician",
      minutes: 20,
      consumablesCost: 0,
      access: ["ramp", "wheels_off"],
      cautions: ["lifting"],
      instructions: [
        SAY.LIFT,
        "Clean the disc faces. With a disc micrometer, measure thickness about 10 mm in from the outer edge at eight points evenly round the disc.",
        "Thickness variation is the thickest reading minus the thinnest. Also note the thinnest against the minimum stamped on the disc.",
        "Use the maker's thickness-variation figure for this vehicle where it differs from the generic limit.",
      ],
      tools: ["disc micrometer", "brake cleaner"],
      result: {
        kind: "measurement",
        quantity: "length",
        unit: "mm",
        rule: "value <= 0.015 mm", // common practice, no published source: typically 0.01–0.03 mm, maker-specific — use the maker's figure
        failMeans:
          "The disc is thicker in places: the pads are pushed back in pulses, felt as judder. Replace both discs on the axle with new pads.",
      },
      falseAlarm: 0.05,
    },
    {
      key: "disc_min_thickness",
      name: "Measure disc thickness against the minimum stamped on the disc",
      skill: "apprentice",
      minutes: 15,
      consumablesCost: 0,
      access: ["ramp", "wheels_off"],
      cautions: ["lifting"],
      instructions: [
        SAY.LIFT,
        "Find the minimum thickness stamped on the disc hat or edge (the part's own marking); if it cannot be read, use the maker's figure for this disc.",
        "Measure the thinnest point of the swept area with a disc micrometer, clear of the lip at the edge.",
        "Record the measured thickness minus the minimum: a negative result is below the limit.",
      ],
      tools: ["disc micrometer", "inspection lamp"],
      result: {
        kind: "measurement",
        quantity: "thickness above the disc's stamped minimum",
        unit: "mm",
        rule: "value >= 0 mm", // common practice: the limit is the minimum stamped on the disc itself; maker-specific — use the maker's figure where unreadable
        gradeScale: "1 mm", // a limit of 0 is no scale: half a millimetre under the stamp is "beyond", more is "far beyond"
        failMeans: "The disc is below its minimum thickness: replace both discs on the axle with new pads.",
      },
      falseAlarm: 0.02,
    },
    {
      key: "disc_surface_visual",
      name: "Inspect the disc faces and pads for hot spots, deposits, scoring and rust",
      skill: "apprentice",
      minutes: 15,
      consumablesCost: 0,
      access: ["ramp", "wheels_off"],
      cautions: ["lifting", "hot_parts"],
      instructions: [
        SAY.LIFT + " Let the brakes cool after a road test: discs can be hot enough to burn.",
        "With the wheel off, look at both faces of the disc in good light, turning it by hand.",
        "Note blue or dark hot spots, shiny patches of pad material, deep grooves, a rust band or lip, and any bare metal on the pads.",
        "Photograph what you find for the owner summary.",
      ],
      tools: ["inspection lamp", "camera"],
      result: {
        kind: "pass_fail",
        failMeans:
          "The disc or pad surface is damaged or contaminated; the pattern points to deposits, overheating, corrosion or worn-out pads.",
      },
      falseAlarm: 0.1,
    },
    {
      key: "pad_thickness",
      name: "Measure brake pad friction material thickness",
      skill: "apprentice",
      minutes: 15,
      consumablesCost: 0,
      access: ["ramp", "wheels_off"],
      cautions: ["lifting"],
      instructions: [
        SAY.LIFT,
        "Measure the friction material only (not the steel backing) on the inner and outer pad at each wheel with a pad gauge.",
        "Record the thinnest pad on each axle.",
      ],
      tools: ["brake pad gauge", "inspection lamp"],
      result: {
        kind: "measurement",
        quantity: "length",
        unit: "mm",
        // Workshop advisory, common practice, no published source. Below 1.5 mm is a roadworthiness
        // defect: DVSA MOT inspection manual §1.1.13 (secondary) — treat that as Stop.
        rule: "value >= 3 mm",
        failMeans:
          "Pads are due for replacement (advise). Under 1.5 mm of friction material is a defect and the car should not be driven until pads are fitted.",
      },
      falseAlarm: 0.03,
    },
    {
      key: "pad_taper_visual",
      name: "Compare inner and outer pad wear and look for taper",
      skill: "apprentice",
      minutes: 10,
      consumablesCost: 0,
      access: ["ramp", "wheels_off"],
      cautions: ["lifting"],
      instructions: [
        SAY.LIFT,
        "On each wheel compare the inner pad with the outer, and each pad's leading edge with its trailing edge.",
        "More than a couple of millimetres between them, or a pad worn on a slant, is a fail; note shiny, stepped wear on the pad ears.",
      ],
      tools: ["brake pad gauge", "inspection lamp"],
      result: {
        kind: "pass_fail",
        failMeans:
          "The pads wear unevenly: the caliper is not sliding freely or the pads are not square in the carrier.",
      },
      falseAlarm: 0.06,
    },
    {
      key: "caliper_carrier_rattle_check",
      name: "Feel for pad and caliper movement in the carrier",
      skill: "technician",
      minutes: 15,
      consumablesCost: 0,
      access: ["ramp", "wheels_off"],
      cautions: ["lifting"],
      instructions: [
        SAY.LIFT,
        "With the wheel off, push and pull the caliper by hand along the disc and up and down: any knock is a fail.",
        "Remove the pads as the maker's procedure describes and look at the carrier abutments for worn steps, rust build-up and missing or flattened anti-rattle clips.",
        "Refit the pads and feel how freely they move: they should slide without rattling.",
      ],
      tools: ["pry bar", "wire brush", "inspection lamp"],
      result: {
        kind: "pass_fail",
        failMeans:
          "The pads or caliper rattle in a worn carrier: clean the abutments and fit new clips, or replace the carrier.",
      },
      falseAlarm: 0.06,
    },
    {
      key: "caliper_bolt_torque",
      name: "Check caliper guide bolts and carrier bolts for tightness",
      skill: "technician",
      minutes: 15,
      consumablesCost: 0,
      access: ["ramp", "wheels_off"],
      cautions: ["lifting"],
      instructions: [
        SAY.LIFT,
        "With a calibrated torque wrench set to the maker's figure, check each caliper guide bolt and each carrier bolt; look for shiny witness marks showing movement.",
        "Any bolt that turns before the wrench clicks was loose: the maker may require new bolts and thread-lock; fit them before the car moves.",
      ],
      tools: ["calibrated torque wrench", "inspection lamp"],
      result: {
        kind: "pass_fail",
        failMeans:
          "A caliper or carrier bolt was loose: fit new bolts to the maker's torque before the car is driven.",
      },
      falseAlarm: 0.02,
    },
    {
      key: "dust_shield_inspect",
      name: "Inspect the dust shields and look for a trapped stone",
      skill: "apprentice",
      minutes: 10,
      consumablesCost: 0,
      access: ["ramp", "wheels_off"],
      cautions: ["lifting", "hot_parts"],
      instructions: [
        SAY.LIFT + " Let the brakes cool first.",
        "Turn the disc by hand and look through the gap between the disc and the dust shield all the way round for a stone, and for a bright ring scored into the disc.",
        "Check the shield for rust holes, loose edges and bends where it meets the disc.",
      ],
      tools: ["inspection lamp", "thin screwdriver"],
      result: {
        kind: "pass_fail",
        failMeans:
          "A stone is trapped or the dust shield touches the disc: remove the stone, or bend back or replace the shield.",
      },
      falseAlarm: 0.04,
    },
    {
      key: "slide_pin_check",
      name: "Remove and inspect the caliper slide pins and boots",
      skill: "technician",
      minutes: 30,
      consumablesCost: 3,
      access: ["ramp", "wheels_off"],
      cautions: ["lifting"],
      instructions: [
        SAY.LIFT + " Hang the caliper on wire, never on its hose.",
        "Remove each slide pin, wipe it and look for rust, steps worn into it and split or swollen boots.",
        "Each pin should slide in its bore by hand without binding or knocking; grease with the maker's specified grease only.",
      ],
      tools: ["socket set", "wire hook", "slide-pin grease"],
      result: {
        kind: "pass_fail",
        failMeans:
          "A slide pin is seized, worn or unprotected: renew the pins and boots (a caliper kit) and check the pads for taper.",
      },
      falseAlarm: 0.05,
    },
    {
      key: "wheel_drag_spin",
      name: "Spin each wheel by hand and feel for brake drag",
      skill: "apprentice",
      minutes: 10,
      consumablesCost: 0,
      access: ["ramp"],
      cautions: ["lifting", "hot_parts"],
      instructions: [
        SAY.LIFT + " Raise the car with all wheels free and the gearbox in neutral.",
        "Spin each wheel by hand, press and release the brake pedal, and spin again: each should turn as freely as its partner.",
        "After a road test, compare hub and disc warmth side to side (infrared thermometer, not bare hands).",
      ],
      tools: ["infrared thermometer"],
      result: {
        kind: "pass_fail",
        failMeans:
          "A brake drags or stays on after release: the caliper piston, slides, hose or parking brake are sticking.",
      },
      falseAlarm: 0.06,
    },
    {
      key: "roller_brake_imbalance",
      name: "Roller brake test: side-to-side balance on each axle",
      skill: "technician",
      minutes: 15,
      consumablesCost: 0,
      access: [],
      cautions: ["rotating_parts", "exhaust_fumes"],
      instructions: [
        "Follow the vehicle maker's procedure (some four-wheel-drive cars must not go on a two-wheel roller set) and the tester's instructions.",
        "Keep everyone clear of the rollers; run the engine only with exhaust extraction connected so the servo works.",
        "Drive one axle onto the rollers, apply the brake slowly to full effort and note each wheel's peak force and any cyclic flutter.",
        "Record the weaker wheel's effort as a percentage of the stronger wheel's on the same axle.",
      ],
      tools: ["roller brake tester", "exhaust extraction"],
      result: {
        kind: "measurement",
        quantity: "weaker wheel effort as percent of stronger, same axle",
        unit: "",
        rule: "value >= 70", // published: DVSA, quoting Directive 2010/48/EU — a defect when one wheel is below 70% of the other
        failMeans:
          "One side brakes much harder than the other: the car will pull. Look for a sticking caliper, contaminated pads or a collapsed hose.",
      },
      falseAlarm: 0.04,
    },
    {
      key: "service_brake_efficiency",
      name: "Roller brake test: service-brake efficiency",
      skill: "technician",
      minutes: 15,
      consumablesCost: 0,
      access: [],
      cautions: ["rotating_parts", "exhaust_fumes"],
      instructions: [
        "Follow the vehicle maker's procedure and the tester's instructions; keep everyone clear of the rollers and run the engine only with exhaust extraction connected.",
        "Test each axle to full effort, add up the peak braking forces and divide by the vehicle's weight (the tester or the plated weight); multiply by 100.",
        "Cars first used before September 2010 have a lower legal figure (commonly 50%): apply the figure for this car and defer to local regulation.",
      ],
      tools: ["roller brake tester", "exhaust extraction"],
      result: {
        kind: "measurement",
        quantity: "total braking effort as percent of vehicle weight",
        unit: "",
        rule: "value >= 58", // published: DVSA MOT inspection manual §1.2, cars first used from 1 Sep 2010 (50% for older cars is from memory), via SOURCES.md
        failMeans:
          "The brakes as a whole are too weak: look for worn-out or contaminated pads, a failing servo or a hydraulic fault before the car is driven.",
      },
      falseAlarm: 0.03,
    },
  ],

  symptomLinks: [
    ...producesSymptoms("brake_pads_worn", {
      squeal_braking: 0.45,
      brake_fluid_low: 0.2,
      grinding_braking: 0.15,
      red_brake_lamp: 0.05,
    }),
    ...producesSymptoms("brake_pads_metal", {
      grinding_braking: 0.9,
      squeal_braking: 0.3,
      vibration_braking: 0.2,
      soft_pedal: 0.1,
      red_brake_lamp: 0.1,
    }),
    ...producesSymptoms("brake_disc_runout_dtv", {
      vibration_braking: 0.85,
      pedal_pulsing: 0.75,
      squeal_braking: 0.05,
    }),
    ...producesSymptoms("brake_pad_deposits", {
      vibration_braking: 0.6,
      pedal_pulsing: 0.5,
      squeal_braking: 0.15,
    }),
    ...producesSymptoms("brake_disc_corrosion", {
      grinding_braking: 0.4,
      vibration_braking: 0.25,
      squeal_braking: 0.25,
      pull_braking: 0.15,
    }),
    ...producesSymptoms("brake_pad_noise", { squeal_braking: 0.85, grinding_braking: 0.05 }),
    ...producesSymptoms("brake_disc_worn_thin", {
      grinding_braking: 0.3,
      vibration_braking: 0.3,
      squeal_braking: 0.2,
      pedal_pulsing: 0.2,
    }),
    ...producesSymptoms("brake_pad_carrier_rattle", {
      rattle_wheel_rough_roads: 0.8,
      knock_brake_apply: 0.4,
      pad_wear_uneven: 0.4,
      squeal_braking: 0.15,
      clunk_front_bumps: 0.1,
    }),
    ...producesSymptoms("stone_in_brake_shield", { scrape_while_driving: 0.9, grinding_braking: 0.2 }),
    ...producesSymptoms("dust_shield_touching", {
      scrape_while_driving: 0.85,
      rattle_wheel_rough_roads: 0.2,
      grinding_braking: 0.1,
    }),
    ...producesSymptoms("brake_caliper_sticking", {
      pull_braking: 0.55,
      hot_wheel_smell: 0.7,
      vibration_braking: 0.2,
      pulls_driving: 0.5,
      high_fuel_consumption: 0.3,
      pad_wear_uneven: 0.5,
    }),
    ...producesSymptoms("caliper_bolt_loose", {
      knock_brake_apply: 0.8,
      rattle_wheel_rough_roads: 0.3,
      vibration_braking: 0.2,
      clunk_front_bumps: 0.15,
    }),
    ...producesSymptoms("slide_pins_worn", {
      pad_wear_uneven: 0.7,
      knock_brake_apply: 0.4,
      rattle_wheel_rough_roads: 0.3,
      squeal_braking: 0.2,
    }),
  ],

  checkLinks: [
    ...bearsOn("brake_road_test", { brakes: 0.6 }),
    ...bearsOn("brake_noise_low_speed", {
      brake_pad_carrier_rattle: 0.6,
      stone_in_brake_shield: 0.75,
      dust_shield_touching: 0.7,
      caliper_bolt_loose: 0.6,
      slide_pins_worn: 0.3,
    }),
    ...bearsOn("disc_runout_dial_gauge", { brake_pad_deposits: 0.15 }),
    // A worn bearing adds a little run-out; a distorted disc or a rusty hub face a lot.
    ...gradedOn("disc_runout_dial_gauge", {
      brake_disc_runout_dtv: { well_within: 0.03, near: 0.12, beyond: 0.45, far_beyond: 0.4 },
      wheel_bearing_worn: { well_within: 0.25, near: 0.4, beyond: 0.3, far_beyond: 0.05 },
      hub_face_corroded: { well_within: 0.05, near: 0.25, beyond: 0.45, far_beyond: 0.25 },
    }),
    ...bearsOn("disc_thickness_variation", { brake_disc_runout_dtv: 0.8, brake_pad_deposits: 0.45 }),
    ...gradedOn("disc_min_thickness", {
      brake_disc_worn_thin: { well_within: 0.01, near: 0.04, beyond: 0.55, far_beyond: 0.4 },
      brake_pads_metal: { well_within: 0.3, near: 0.4, beyond: 0.2, far_beyond: 0.1 },
    }),
    ...bearsOn("disc_surface_visual", {
      brake_pad_deposits: 0.7,
      brake_disc_runout_dtv: 0.35,
      brake_disc_corrosion: 0.9,
      brake_pads_metal: 0.95,
      brake_pad_noise: 0.35,
      brake_disc_worn_thin: 0.6,
    }),
    // Graded: pads near the limit mostly read just under the advisory line, pads on the backing
    // plate far under it (a 0.8 mm reading points to the backing plate). Starter estimates.
    ...gradedOn("pad_thickness", {
      brake_pads_worn: { well_within: 0.02, near: 0.08, beyond: 0.75, far_beyond: 0.15 },
      brake_pads_metal: { well_within: 0.005, near: 0.015, beyond: 0.08, far_beyond: 0.9 },
    }),
    ...bearsOn("pad_taper_visual", {
      slide_pins_worn: 0.7,
      brake_caliper_sticking: 0.5,
      brake_pad_carrier_rattle: 0.35,
    }),
    ...bearsOn("caliper_carrier_rattle_check", {
      brake_pad_carrier_rattle: 0.85,
      slide_pins_worn: 0.5,
      caliper_bolt_loose: 0.6,
    }),
    ...bearsOn("caliper_bolt_torque", { caliper_bolt_loose: 0.95 }),
    ...bearsOn("dust_shield_inspect", { stone_in_brake_shield: 0.85, dust_shield_touching: 0.9 }),
    ...bearsOn("slide_pin_check", { slide_pins_worn: 0.85, brake_caliper_sticking: 0.6 }),
    ...bearsOn("wheel_drag_spin", {
      brake_caliper_sticking: 0.85,
      brake_hose_collapsed: 0.7,
      handbrake_cable_seized: 0.7,
      handbrake_caliper_mech: 0.5,
    }),
    ...bearsOn("roller_brake_imbalance", {
      brake_caliper_sticking: 0.6,
      brake_fluid_leak: 0.4,
      brake_disc_runout_dtv: 0.3,
      brake_pads_metal: 0.3,
      brake_hose_collapsed: 0.6,
    }),
    ...bearsOn("service_brake_efficiency", {
      brake_pads_metal: 0.5,
      brake_servo_vacuum: 0.6,
      brake_fluid_leak: 0.4,
      brake_master_cylinder: 0.4,
    }),
  ],
};
