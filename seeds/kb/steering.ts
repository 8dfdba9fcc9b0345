// Suspension and steering, part 2: the steering rack and column, and power assistance (hydraulic
// and electric). The system node is in suspension-steering.ts.
import { bearsOn, componentNode, failureMode, producesSymptoms, SAY } from "./build";
import type { KnowledgeBaseSeed } from "./types";

const fm = (parent: string, f: Parameters<typeof failureMode>[2]) =>
  failureMode("suspension_steering", parent, f);
const sym = { system: "suspension_steering" } as const;

export const steering: KnowledgeBaseSeed = {
  symptoms: [
    {
      ...sym,
      key: "heavy_steering",
      name: "Heavy steering at low speed",
      kind: "pull",
      synonyms: [
        "steering heavy",
        "hard to turn the wheel",
        "no power steering",
        "stiff steering when parking",
      ],
      conditions: ["low speed", "parking"],
      leak: 0.03,
    },
    {
      ...sym,
      key: "whine_steering",
      name: "Whine when turning the steering wheel",
      kind: "noise",
      synonyms: ["power steering whine", "moan on full lock", "groan when turning the wheel", "pump noise"],
      conditions: ["turning", "parking", "engine running"],
      leak: 0.03,
    },
    {
      ...sym,
      key: "knock_steering",
      name: "Knock felt through the steering wheel",
      kind: "noise",
      synonyms: [
        "knock in the steering",
        "clunk through the steering wheel",
        "steering knocks over bumps",
        "rattle in the steering column",
        "play in the steering wheel",
      ],
      conditions: ["over bumps", "turning"],
      leak: 0.03,
    },
    {
      ...sym,
      key: "steering_notchy",
      name: "Steering notchy, sticky or slow to self-centre",
      kind: "pull",
      synonyms: [
        "notchy steering",
        "steering sticks",
        "steering doesn't come back straight",
        "steering feels lumpy",
        "tight spot in the steering",
      ],
      conditions: ["turning", "low speed"],
      leak: 0.03,
    },
    {
      ...sym,
      key: "pas_lamp",
      name: "Power steering warning lamp on",
      kind: "warning_lamp",
      synonyms: [
        "power steering light",
        "steering warning light",
        "eps light",
        "steering wheel symbol with exclamation mark",
        "power steering fault message",
      ],
      conditions: ["after start-up", "while driving"],
      leak: 0.02,
    },
    {
      ...sym,
      key: "pas_fluid_leak",
      name: "Power-steering fluid leak at the front",
      kind: "leak",
      synonyms: [
        "power steering fluid leak",
        "red oil under the front",
        "steering fluid low",
        "oily rack gaiter",
        "drips under the engine bay",
      ],
      conditions: ["parked", "engine running"],
      leak: 0.02,
    },
  ],

  causes: [
    componentNode(
      "suspension_steering",
      "steering_assist",
      "Power-steering assist",
      "Hydraulic pump, fluid and hoses, or the electric assist motor and its sensors.",
    ),
    componentNode(
      "suspension_steering",
      "steering_rack_column",
      "Steering rack and column",
      "The rack and its gaiters, the column and the intermediate shaft joints.",
    ),
    fm("steering_assist", {
      key: "pas_pump_fluid",
      name: "Power-steering fluid low or pump worn",
      baseRate: 1.5,
      repairMinutes: 120,
      partsCost: 180,
      priority: "soon",
      description:
        "On hydraulic assist: low fluid from a leaking hose or rack seal, or a tired pump, gives whine and heavy steering. Not for cars with electric assist.",
      ownerDescription:
        "The power steering is low on fluid or its pump is wearing out, so the steering whines and feels heavy.",
      ifLeft:
        "The pump wears faster and the steering can suddenly become very heavy, which is hard work and tiring in an emergency.",
      applicability: { fuel: ["petrol", "diesel", "lpg"], minAgeYears: 8 },
    }),
    fm("steering_assist", {
      key: "pas_hose_leak",
      name: "Power-steering hose or pipe leaking",
      baseRate: 1.5,
      repairMinutes: 90,
      partsCost: 80,
      priority: "soon",
      description:
        "A high-pressure hose crimp or a return hose weeps fluid: level drops, whine, and fluid can spray onto the hot exhaust. Hydraulic assist only.",
      ownerDescription: "One of the power-steering hoses is leaking fluid.",
      ifLeft: "The fluid runs low and the pump is damaged; oil dripping on hot parts is a fire risk.",
      applicability: { fuel: ["petrol", "diesel", "lpg"], minAgeYears: 8 },
    }),
    fm("steering_assist", {
      key: "eps_fault",
      name: "Electric power-steering motor or torque sensor fault",
      baseRate: 1.5,
      repairMinutes: 120,
      partsCost: 450,
      priority: "soon",
      description:
        "The electric assist unit (column or rack mounted), its torque sensor or its supply has failed, or the system has cut assistance after a low-voltage event: lamp on, heavy or uneven steering. Electric assist only.",
      ownerDescription: "The electric power steering has developed a fault, so the steering is heavy.",
      ifLeft:
        "The steering stays heavy or can lose its help suddenly; it still steers, but needs much more effort.",
      applicability: { minKm: 80000, youngFactor: 0.3 },
    }),
    fm("steering_assist", {
      key: "steering_angle_sensor",
      name: "Steering-angle sensor not calibrated or faulty",
      baseRate: 1,
      repairMinutes: 30,
      partsCost: 0,
      priority: "soon",
      description:
        "After alignment, battery disconnection or column work the angle sensor has not been re-zeroed, or has failed: stability and power-steering lamps, and the stability system may intervene wrongly.",
      ownerDescription:
        "The sensor that tells the car which way the steering wheel is turned needs setting up again.",
      ifLeft: "The stability control stays switched off, or may brake a wheel when it should not.",
    }),
    fm("steering_rack_column", {
      key: "steering_rack_worn",
      name: "Steering rack worn inside (knock or leaking seals)",
      baseRate: 1.5,
      repairMinutes: 180,
      partsCost: 300,
      priority: "soon",
      description:
        "The rack bush or the rack-and-pinion mesh has worn, or its seals leak: a knock through the wheel over bumps, free play and, on hydraulic racks, fluid in the gaiters.",
      ownerDescription: "The steering rack, the part that turns the wheels, has worn inside.",
      ifLeft:
        "The knock and looseness grow, the steering becomes less precise, and a leaking rack empties the power steering.",
      applicability: { minKm: 120000, youngFactor: 0.2 },
    }),
    fm("steering_rack_column", {
      key: "rack_gaiter_split",
      name: "Steering rack gaiter split",
      baseRate: 2,
      repairMinutes: 60,
      partsCost: 20,
      priority: "watch",
      description:
        "The concertina boot at the end of the rack has split; water and grit will wear the inner joint and the rack. Many roadworthiness tests note it.",
      ownerDescription: "The rubber cover over the end of the steering rack has split.",
      ifLeft:
        "Water and dirt get in and wear out the inner steering joint and the rack, which is a much bigger repair.",
    }),
    fm("steering_rack_column", {
      key: "column_joint_worn",
      name: "Steering column or intermediate-shaft joint worn",
      baseRate: 1,
      repairMinutes: 90,
      partsCost: 90,
      priority: "soon",
      description:
        "The universal joints or splines between column and rack have worn or gone dry: a knock felt in the wheel, notchy steering and lost motion.",
      ownerDescription: "A joint in the shaft between the steering wheel and the steering rack has worn.",
      ifLeft: "The steering gets notchier and looser; a badly worn joint can affect control.",
      applicability: { minKm: 120000, youngFactor: 0.2 },
    }),
  ],

  checks: [
    {
      key: "pas_fluid_listen",
      name: "Check power-steering fluid and listen to the pump",
      skill: "apprentice",
      minutes: 10,
      consumablesCost: 0,
      access: ["bonnet_open"],
      cautions: ["hot_parts", "rotating_parts", "exhaust_fumes"],
      instructions: [
        SAY.RUNNING,
        "With the engine off, read the fluid level against the marks; look for wet hoses and a damp rack gaiter.",
        "With the engine idling, turn lock to lock and listen at the pump for whine or groan; do not hold the steering on full lock. The pump and its pipes get hot.",
      ],
      tools: ["inspection lamp", "exhaust extraction"],
      result: {
        kind: "pass_fail",
        failMeans:
          "Fluid is low or the pump whines: find the leak, top up with the specified fluid, and judge the pump.",
      },
      falseAlarm: 0.06,
    },
    {
      key: "pas_leak_inspect",
      name: "Trace a power-steering fluid leak on the ramp",
      skill: "technician",
      minutes: 20,
      consumablesCost: 0,
      access: ["ramp"],
      cautions: ["lifting", "hot_parts"],
      instructions: [
        SAY.LIFT + " Hoses near the exhaust can be hot after running.",
        "Clean the suspect area, then follow the high-pressure and return hoses from the pump to the rack, checking crimps and unions for wetness.",
        "Squeeze each rack gaiter: fluid inside it means the rack seals are leaking.",
      ],
      tools: ["inspection lamp", "degreaser"],
      result: {
        kind: "pass_fail",
        failMeans:
          "Fluid is escaping from a hose, the pump or the rack seals: repair the part found and refill with the specified fluid.",
      },
      falseAlarm: 0.05,
    },
    {
      key: "eps_fault_memory",
      name: "Read the power-steering unit's faults and live sensor data",
      skill: "technician",
      minutes: 15,
      consumablesCost: 0,
      access: ["scan_tool"],
      cautions: [],
      instructions: [
        "Connect the scan tool, read the steering unit's stored faults, supply voltage, torque-sensor reading and motor current.",
        "Check the battery and charging first: many units cut assistance after low voltage. Note faults before clearing.",
      ],
      tools: ["scan tool", "multimeter"],
      result: {
        kind: "pass_fail",
        failMeans:
          "A steering-unit fault is stored or a sensor reads wrong: repair the supply or wiring, or replace the unit.",
      },
      falseAlarm: 0.06,
    },
    {
      key: "steering_angle_check",
      name: "Read the steering-angle sensor with the wheels straight and calibrate it",
      skill: "technician",
      minutes: 15,
      consumablesCost: 0,
      access: ["scan_tool"],
      cautions: [],
      instructions: [
        "With the wheels straight ahead on level ground, read the steering angle on the scan tool: it should be close to zero.",
        "Turn to each lock and back, watching the reading follow smoothly. If it is offset, run the calibration routine the maker's procedure gives, then road test.",
      ],
      tools: ["scan tool"],
      result: {
        kind: "pass_fail",
        failMeans:
          "The angle reading is offset or jumps: calibrate the sensor, or replace it if it will not calibrate.",
      },
      falseAlarm: 0.05,
    },
    {
      key: "steering_rim_free_play",
      name: "Measure free play at the steering-wheel rim",
      skill: "technician",
      minutes: 10,
      consumablesCost: 0,
      access: [],
      cautions: ["exhaust_fumes"],
      instructions: [
        SAY.FUMES +
          " On hydraulic assist run the engine so the assistance works; on electric assist the ignition on is usually enough.",
        "With the road wheels straight ahead on the ground, turn the steering wheel gently one way until a road wheel just starts to move, mark the rim, then turn the other way until it moves again.",
        "Measure the distance between the two marks along the rim. Defer to local regulation and the maker's figure for this car.",
      ],
      tools: ["tape measure", "masking tape"],
      result: {
        kind: "measurement",
        quantity: "free play at the rim",
        unit: "mm",
        rule: "value <= 13 mm", // from memory: a roadworthiness-test figure for rack-and-pinion steering, not verified here; defer to local regulation
        failMeans:
          "There is too much free play in the steering: find the worn joint, column joint or rack before the car is driven far.",
      },
      falseAlarm: 0.03,
    },
    {
      key: "rack_knock_check",
      name: "Feel for rack and column knock with a helper rocking the wheel",
      skill: "technician",
      minutes: 15,
      consumablesCost: 0,
      access: ["ramp"],
      cautions: ["lifting"],
      instructions: [
        SAY.LIFT + " Use a drive-on ramp so the wheels stay loaded.",
        "Have a helper rock the steering wheel quickly a little each way while you hold the rack body, then the intermediate-shaft joints under the dashboard and at the bulkhead.",
        "A knock in the rack mounting or body, or lost motion across a shaft joint, is a fail.",
      ],
      tools: ["inspection lamp"],
      result: {
        kind: "pass_fail",
        failMeans:
          "The rack or a column joint knocks: replace the worn part and re-set the alignment if the rack is changed.",
      },
      falseAlarm: 0.05,
    },
    {
      key: "steering_lock_to_lock",
      name: "Turn the steering lock to lock on the ground and feel for notches",
      skill: "apprentice",
      minutes: 5,
      consumablesCost: 0,
      access: [],
      cautions: ["exhaust_fumes"],
      instructions: [
        SAY.FUMES,
        "With the car on its wheels and the engine running, turn the steering slowly from lock to lock and back, then let go of the wheel just off the straight-ahead position.",
        "Note tight or notchy spots, uneven effort side to side, and whether the wheel returns towards the centre on its own.",
      ],
      tools: ["exhaust extraction"],
      result: {
        kind: "pass_fail",
        failMeans:
          "The steering is notchy, uneven or does not self-centre: look at the column joints, top mounts and the assist unit.",
      },
      falseAlarm: 0.06,
    },
  ],

  symptomLinks: [
    ...producesSymptoms("pas_pump_fluid", { whine_steering: 0.8, heavy_steering: 0.6, pas_fluid_leak: 0.3 }),
    ...producesSymptoms("pas_hose_leak", { pas_fluid_leak: 0.85, whine_steering: 0.4, heavy_steering: 0.3 }),
    ...producesSymptoms("eps_fault", { pas_lamp: 0.85, heavy_steering: 0.8, steering_notchy: 0.3 }),
    ...producesSymptoms("steering_angle_sensor", { esc_lamp: 0.7, steering_off_centre: 0.2, pas_lamp: 0.2 }),
    ...producesSymptoms("steering_rack_worn", {
      knock_steering: 0.6,
      wander_vague: 0.4,
      pas_fluid_leak: 0.3,
      clunk_front_bumps: 0.2,
    }),
    ...producesSymptoms("rack_gaiter_split", { split_boot_visible: 0.85, pas_fluid_leak: 0.1 }),
    ...producesSymptoms("column_joint_worn", { knock_steering: 0.7, steering_notchy: 0.5 }),
  ],

  checkLinks: [
    ...bearsOn("pas_fluid_listen", { pas_pump_fluid: 0.8, pas_hose_leak: 0.5 }),
    ...bearsOn("pas_leak_inspect", { pas_hose_leak: 0.85, steering_rack_worn: 0.3, pas_pump_fluid: 0.4 }),
    ...bearsOn("eps_fault_memory", { eps_fault: 0.85, steering_angle_sensor: 0.5 }),
    ...bearsOn("steering_angle_check", { steering_angle_sensor: 0.85 }),
    ...bearsOn("steering_rim_free_play", {
      steering_rack_worn: 0.6,
      column_joint_worn: 0.6,
      inner_track_rod_worn: 0.5,
      track_rod_end_worn: 0.4,
    }),
    ...bearsOn("rack_knock_check", { steering_rack_worn: 0.75, column_joint_worn: 0.7 }),
    ...bearsOn("steering_lock_to_lock", {
      column_joint_worn: 0.5,
      top_mount_worn: 0.4,
      eps_fault: 0.4,
      pas_pump_fluid: 0.3,
    }),
  ],
};
