// Body, part 2: wheel-arch liners and undertrays, water leaks (sunroof drains, screen and boot
// seals) and structural corrosion at sills, jacking points and suspension or subframe mountings.
// The system node is in body.ts.
import { bearsOn, componentNode, failureMode, producesSymptoms, SAY } from "./build";
import type { KnowledgeBaseSeed } from "./types";

const fm = (parent: string, f: Parameters<typeof failureMode>[2]) => failureMode("body", parent, f);
const sym = { system: "body" } as const;

export const bodyStructure: KnowledgeBaseSeed = {
  symptoms: [
    {
      ...sym,
      key: "flapping_underneath",
      name: "Flapping or scraping from under the front at speed",
      kind: "noise",
      synonyms: [
        "something dragging under the car",
        "undertray hanging down",
        "scraping over speed bumps",
        "flapping noise at motorway speed",
        "plastic rubbing underneath",
      ],
      conditions: ["at speed", "over bumps"],
      leak: 0.03,
    },
    {
      ...sym,
      key: "liner_rubbing_tyre",
      name: "Tyre rubs the wheel-arch liner on full lock or over bumps",
      kind: "noise",
      synonyms: [
        "tyre rubbing on lock",
        "arch liner loose",
        "rubbing noise when turning",
        "scuffing from the wheel arch",
      ],
      conditions: ["turning at full lock", "over bumps"],
      leak: 0.03,
    },
    {
      ...sym,
      key: "water_in_footwell",
      name: "Water in a footwell or damp carpets",
      kind: "leak",
      synonyms: [
        "wet carpet",
        "damp carpet passenger side",
        "wet footwell",
        "water under the mats",
        "puddle in the car",
      ],
      conditions: ["after rain", "after a car wash"],
      leak: 0.03,
    },
    {
      ...sym,
      key: "water_from_headlining",
      name: "Water dripping from the headlining or a pillar",
      kind: "leak",
      synonyms: [
        "water dripping from the roof lining",
        "sunroof leaking",
        "wet headlining",
        "drip from the grab handle",
        "water down the windscreen pillar",
      ],
      conditions: ["after rain"],
      leak: 0.02,
    },
    {
      ...sym,
      key: "water_in_boot",
      name: "Water in the boot or spare-wheel well",
      kind: "leak",
      synonyms: ["wet boot", "water in the spare wheel well", "boot floor wet", "puddle in the boot"],
      conditions: ["after rain"],
      leak: 0.02,
    },
    {
      ...sym,
      key: "musty_smell",
      name: "Musty, damp smell inside the car",
      kind: "smell",
      synonyms: [
        "damp smell",
        "mouldy smell in the car",
        "smells like wet dog",
        "mildew smell",
        "windows steam up and it smells damp",
      ],
      conditions: ["after rain", "with the heater on"],
      leak: 0.04,
    },
    {
      ...sym,
      key: "rust_sills_visible",
      name: "Rust bubbling or holes along the sills",
      kind: "visible",
      synonyms: [
        "rusty sills",
        "rust under the doors",
        "holes in the sill",
        "sill rot",
        "bubbling paint on the sills",
      ],
      conditions: ["on the ramp", "buying a used car"],
      leak: 0.02,
    },
    {
      ...sym,
      key: "jacking_point_damage",
      name: "Jacking point crushed, split or rusted",
      kind: "visible",
      synonyms: ["jacking point rusted", "sill seam squashed", "jack point damaged", "pinch weld bent"],
      conditions: ["on the ramp"],
      leak: 0.03,
    }, // a seam flattened by a trolley jack, without corrosion, is cosmetic
    {
      ...sym,
      key: "underbody_rust_visible",
      name: "Heavy rust on the underbody near the suspension mountings",
      kind: "visible",
      synonyms: [
        "rotten subframe mounts",
        "rust round the suspension mounts",
        "chassis rust",
        "floor rusted through",
        "structural rust",
      ],
      conditions: ["on the ramp", "buying a used car"],
      leak: 0.02,
    },
  ],

  causes: [
    componentNode(
      "body",
      "body_underbody",
      "Arch liners and undertrays",
      "Plastic wheel-arch liners, the engine undertray and their clips and screws.",
    ),
    componentNode(
      "body",
      "body_water_leaks",
      "Drains and body seals",
      "Sunroof drains, the windscreen seal, and the boot seal and rear-lamp gaskets.",
    ),
    componentNode(
      "body",
      "body_structure",
      "Body structure",
      "Sills, jacking points, floor and the body around the suspension and subframe mountings.",
    ),
    fm("body_underbody", {
      key: "arch_liner_loose",
      name: "Wheel-arch liner loose or torn",
      baseRate: 2.5,
      repairMinutes: 20,
      partsCost: 15,
      priority: "watch",
      description:
        "Missing clips or a torn liner let it sag onto the tyre: rubbing on full lock or over bumps, and dirt packed onto the suspension and body.",
      ownerDescription: "The plastic lining inside a wheel arch has come loose and rubs on the tyre.",
      ifLeft: "It wears through the tyre's shoulder or tears off, and mud collects where rust can start.",
    }),
    fm("body_underbody", {
      key: "undertray_loose",
      name: "Undertray loose, torn or missing",
      baseRate: 2.5,
      repairMinutes: 20,
      partsCost: 20,
      priority: "watch",
      description:
        "Screws and clips lost after a service or a kerb strike: the tray hangs, flaps at speed and scrapes over bumps; if missing, the engine bay gets wet and dirty.",
      ownerDescription: "The plastic cover under the engine has come loose or is missing.",
      ifLeft:
        "It can tear off on the road, and without it water and dirt get at the engine's belts and wiring.",
    }),
    fm("body_water_leaks", {
      key: "sunroof_drain_blocked",
      name: "Sunroof drain tubes blocked or disconnected",
      baseRate: 1.5,
      repairMinutes: 45,
      partsCost: 0,
      priority: "soon",
      description:
        "The tubes that drain the sunroof tray down the pillars are blocked by debris or have come off: water pours from the headlining or pillar trims and into the footwells.",
      ownerDescription: "The small tubes that drain rain water from the sunroof are blocked.",
      ifLeft: "Water keeps coming in, soaking carpets and damaging wiring and electronics under them.",
      applicability: { minAgeYears: 5 },
    }),
    fm("body_water_leaks", {
      key: "windscreen_seal_leak",
      name: "Windscreen seal or scuttle drain leaking",
      baseRate: 1,
      repairMinutes: 90,
      partsCost: 30,
      priority: "soon",
      description:
        "A failed bond at the windscreen (often after a screen replacement) or a blocked scuttle drain lets water into the front footwells and along the dashboard.",
      ownerDescription: "Rain water is getting in around the windscreen or through the drain below it.",
      ifLeft: "The carpets stay wet, electrics under the dashboard can corrode and the car smells damp.",
      applicability: { minAgeYears: 6 },
    }),
    fm("body_water_leaks", {
      key: "boot_seal_leak",
      name: "Boot seal or rear-lamp gasket leaking",
      baseRate: 1.5,
      repairMinutes: 45,
      partsCost: 40,
      priority: "watch",
      description:
        "A perished boot seal, a failed rear-lamp gasket or an aerial seal lets water into the boot, where it collects in the spare-wheel well.",
      ownerDescription: "Rain water is getting into the boot past a worn seal.",
      ifLeft: "Water collects in the spare-wheel well, the floor rusts and the car smells damp.",
      applicability: { minAgeYears: 6 },
    }),
    fm("body_structure", {
      key: "sill_corrosion",
      name: "Structural corrosion in a sill",
      baseRate: 2,
      repairMinutes: 480,
      partsCost: 150,
      priority: "stop",
      description:
        "Rust has holed or weakened a sill, the box section that carries much of the body's strength; within the areas roadworthiness tests treat as structural this is a serious defect.",
      ownerDescription:
        "Rust has eaten into the strong box sections along the bottom of the car, under the doors.",
      ifLeft:
        "The body loses strength, which matters most in a crash, and the rust spreads quickly. The car should not be driven until it has a welded repair.",
      applicability: { minAgeYears: 10 },
    }),
    fm("body_structure", {
      key: "jacking_point_corrosion",
      name: "Jacking point corroded or crushed",
      baseRate: 1.5,
      repairMinutes: 180,
      partsCost: 40,
      priority: "soon",
      description:
        "The reinforced jacking points have rusted or been crushed by a badly placed jack: the car cannot be lifted there safely and the damage spreads into the sill.",
      ownerDescription: "One of the points where the car is lifted has rusted or been crushed.",
      ifLeft: "The car cannot be lifted safely at that point, and the damage lets rust into the sill.",
      applicability: { minAgeYears: 8 },
    }),
    fm("body_structure", {
      key: "subframe_mount_corrosion",
      name: "Corrosion around a subframe or suspension mounting",
      baseRate: 0.5,
      repairMinutes: 600,
      partsCost: 200,
      priority: "stop",
      description:
        "Rust has weakened the body within about 30 cm of a subframe, suspension or seat-belt mounting: the mounting can move or tear out. Not safe to drive.",
      ownerDescription: "Rust has weakened the body around a point where the suspension is bolted on.",
      ifLeft:
        "The suspension mounting could tear out of the body, causing loss of control. The car should not be driven until it is repaired.",
      applicability: { minAgeYears: 12 },
    }),
  ],

  checks: [
    {
      key: "underbody_panel_inspect",
      name: "Inspect the arch liners and undertray and their fixings",
      skill: "apprentice",
      minutes: 10,
      consumablesCost: 0,
      access: ["ramp"],
      cautions: ["lifting"],
      instructions: [
        SAY.LIFT,
        "Look at each arch liner and the undertray for missing clips and screws, tears and scrape marks; pull gently to see what hangs loose.",
      ],
      tools: ["inspection lamp"],
      result: {
        kind: "pass_fail",
        failMeans: "A liner or the undertray is loose, torn or missing: refit with new clips or replace it.",
      },
      falseAlarm: 0.05,
    },
    {
      key: "liner_rub_check",
      name: "Turn to full lock and look for the tyre rubbing the arch",
      skill: "apprentice",
      minutes: 5,
      consumablesCost: 0,
      access: [],
      cautions: [],
      instructions: [
        "With the car on its wheels, turn the steering to each full lock and look into the arch with a lamp for shiny rub marks on the liner and on the tyre's shoulder.",
        "Push the front down at each corner and watch the gap between tyre and liner.",
      ],
      tools: ["inspection lamp"],
      result: {
        kind: "pass_fail",
        failMeans:
          "The tyre touches the liner: refit the liner; if it is fitted correctly, check the tyre size and the suspension.",
      },
      falseAlarm: 0.05,
    },
    {
      key: "sunroof_drain_test",
      name: "Pour water into the sunroof tray and watch it drain",
      skill: "technician",
      minutes: 15,
      consumablesCost: 0,
      access: [],
      cautions: [],
      instructions: [
        "Open the sunroof and pour a cup of water slowly into each corner of the tray.",
        "It should run out quickly under the car (behind the front wheels or at the rear); water that pools or appears inside means that drain is blocked or off its spigot. Clear with a flexible line, never compressed air at full pressure.",
      ],
      tools: ["jug of water", "flexible drain-clearing line", "inspection lamp"],
      result: {
        kind: "pass_fail",
        failMeans: "A sunroof drain is blocked or disconnected: clear or refit it and dry the car.",
      },
      falseAlarm: 0.04,
    },
    {
      key: "water_leak_trace",
      name: "Trace a water leak with a hose and a helper inside",
      skill: "technician",
      minutes: 40,
      consumablesCost: 0,
      access: [],
      cautions: [],
      instructions: [
        "Lift the carpets and find how far the water has spread and where it is wettest; dry the area.",
        "With a helper inside with a lamp, hose each area in turn, low to high: door seals, screen, scuttle drains, sunroof, boot seal and rear lamps; wait between areas.",
        "Note where water first appears; taste is not a test, but a sweet smell means coolant, not rain.",
      ],
      tools: ["hose with a gentle spray", "inspection lamp", "towels"],
      result: {
        kind: "pass_fail",
        failMeans:
          "Rain water gets in at a seal or drain: the first wet point names it; repair the seal or clear the drain.",
      },
      falseAlarm: 0.05,
    },
    {
      key: "boot_seal_inspect",
      name: "Lift the boot floor and inspect the boot seal and lamp gaskets",
      skill: "apprentice",
      minutes: 10,
      consumablesCost: 0,
      access: [],
      cautions: [],
      instructions: [
        "Lift the boot floor and look for water, a tide mark or rust in the spare-wheel well.",
        "Look along the boot seal for splits and flattening and behind the rear lamps for wet gaskets.",
      ],
      tools: ["inspection lamp"],
      result: {
        kind: "pass_fail",
        failMeans: "Water is getting into the boot: renew the seal or lamp gasket, dry the well.",
      },
      falseAlarm: 0.05,
    },
    {
      key: "sill_corrosion_inspect",
      name: "Inspect and probe the sills for structural corrosion",
      skill: "technician",
      minutes: 20,
      consumablesCost: 0,
      access: ["ramp"],
      cautions: ["lifting"],
      instructions: [
        SAY.LIFT,
        "Look along both sills from below and from the door openings; press suspect areas firmly with a thumb and tap them with a plastic-headed tool — do not stab healthy metal or damage protective coatings.",
        "Holes, metal that gives, or rust that reaches inner panels within the structural areas is a fail; surface rust alone is an advisory. Photograph it for the owner summary.",
      ],
      tools: ["inspection lamp", "plastic-headed probe", "camera"],
      result: {
        kind: "pass_fail",
        failMeans: "A sill has structural corrosion: it needs a welded repair before the car is used.",
      },
      falseAlarm: 0.05,
    },
    {
      key: "jacking_point_inspect",
      name: "Inspect the jacking points",
      skill: "apprentice",
      minutes: 10,
      consumablesCost: 0,
      access: ["ramp"],
      cautions: ["lifting"],
      instructions: [
        SAY.LIFT +
          " If a jacking point looks weak, do not use it: lift on the maker's alternative points only.",
        "Look at each jacking point for rust holes, split seams and crushed reinforcement, and for rust spreading from it into the sill.",
      ],
      tools: ["inspection lamp", "camera"],
      result: {
        kind: "pass_fail",
        failMeans:
          "A jacking point is corroded or crushed: repair it, and do not lift the car there meanwhile.",
      },
      falseAlarm: 0.05,
    },
    {
      key: "structural_mount_inspect",
      name: "Inspect the body round the subframe and suspension mountings",
      skill: "senior",
      minutes: 30,
      consumablesCost: 0,
      access: ["ramp"],
      cautions: ["lifting"],
      instructions: [
        SAY.LIFT,
        "Inspect the body within about 30 cm of every subframe, suspension and seat-belt mounting for holes, flaking layers and metal that gives under firm thumb pressure.",
        "Any weakened metal at a mounting is a fail and the car should not be driven; record and photograph it.",
      ],
      tools: ["inspection lamp", "plastic-headed probe", "camera"],
      result: {
        kind: "pass_fail",
        failMeans: "The body is weakened at a mounting: do not let the car be driven until it is repaired.",
      },
      falseAlarm: 0.04,
    },
  ],

  symptomLinks: [
    ...producesSymptoms("arch_liner_loose", { liner_rubbing_tyre: 0.8, flapping_underneath: 0.4 }),
    ...producesSymptoms("undertray_loose", { flapping_underneath: 0.85, rattle_underneath: 0.2 }),
    ...producesSymptoms("sunroof_drain_blocked", {
      water_from_headlining: 0.85,
      water_in_footwell: 0.5,
      musty_smell: 0.3,
    }),
    ...producesSymptoms("windscreen_seal_leak", {
      water_in_footwell: 0.6,
      water_from_headlining: 0.3,
      musty_smell: 0.3,
    }),
    ...producesSymptoms("boot_seal_leak", { water_in_boot: 0.85, musty_smell: 0.3 }),
    ...producesSymptoms("sill_corrosion", { rust_sills_visible: 0.9, jacking_point_damage: 0.3 }),
    ...producesSymptoms("jacking_point_corrosion", { jacking_point_damage: 0.85, rust_sills_visible: 0.4 }),
    ...producesSymptoms("subframe_mount_corrosion", {
      underbody_rust_visible: 0.85,
      clunk_braking_setoff: 0.3,
      wander_vague: 0.1,
    }),
    ...producesSymptoms("spring_seat_corroded", { underbody_rust_visible: 0.4 }),
  ],

  checkLinks: [
    ...bearsOn("underbody_panel_inspect", { body_underbody: 0.85 }),
    ...bearsOn("liner_rub_check", { arch_liner_loose: 0.8 }),
    ...bearsOn("sunroof_drain_test", { sunroof_drain_blocked: 0.85 }),
    ...bearsOn("water_leak_trace", { body_water_leaks: 0.7, door_seal_perished: 0.5 }),
    ...bearsOn("boot_seal_inspect", { boot_seal_leak: 0.8, lamp_water_ingress: 0.3 }),
    ...bearsOn("sill_corrosion_inspect", { sill_corrosion: 0.85, jacking_point_corrosion: 0.5 }),
    ...bearsOn("jacking_point_inspect", { jacking_point_corrosion: 0.85 }),
    ...bearsOn("structural_mount_inspect", { subframe_mount_corrosion: 0.85, spring_seat_corroded: 0.4 }),
  ],
};
