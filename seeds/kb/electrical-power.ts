// Electrical, part 1: battery, terminals and earth straps, charging, starting and parasitic drain.
// Part 2 (windows, lighting) is electrical-body.ts; part 3 (locking and keys, wipers, horn, fuses,
// heater blower, airbags) is electrical-comfort.ts.
import {
  bearsOn,
  COMBUSTION,
  componentNode,
  failureMode,
  producesSymptoms,
  SAY,
  systemNode,
  gradedOn,
} from "./build";
import type { KnowledgeBaseSeed } from "./types";

const fm = (parent: string, f: Parameters<typeof failureMode>[2]) => failureMode("electrical", parent, f);
const sym = { system: "electrical" } as const;
// Hybrids and electric cars charge the 12 V battery and start without a belt-driven alternator or
// a conventional starter motor.
const ENGINE_DRIVEN = ["petrol", "diesel", "lpg"] as const;

export const electricalPower: KnowledgeBaseSeed = {
  symptoms: [
    {
      ...sym,
      key: "battery_flat",
      name: "Battery flat after standing",
      kind: "electrical",
      synonyms: [
        "flat battery",
        "dead battery",
        "won't start after a few days",
        "needs a jump start",
        "battery keeps going flat",
      ],
      conditions: ["after standing", "cold morning"],
      leak: 0.05,
    }, // lights left on and very short trips are the usual leak
    {
      ...sym,
      key: "no_crank",
      name: "Engine won't crank (click or nothing)",
      kind: "electrical",
      synonyms: [
        "won't start",
        "no crank",
        "just clicks",
        "nothing happens when I turn the key",
        "starter doesn't turn",
        "dead when I press start",
      ],
      conditions: ["starting"],
      leak: 0.02,
    },
    {
      ...sym,
      key: "slow_crank",
      name: "Slow cranking, worse when cold",
      kind: "electrical",
      synonyms: ["turns over slowly", "labouring to start", "weak start", "struggles to turn over"],
      conditions: ["starting", "cold morning"],
      leak: 0.03,
    },
    {
      ...sym,
      key: "starts_only_in_neutral",
      name: "Starter works only in neutral or with the pedal pushed hard",
      kind: "electrical",
      synonyms: [
        "only starts in neutral",
        "have to press the clutch really hard to start",
        "starts in park but not neutral",
        "start button does nothing unless I jiggle the pedal",
      ],
      conditions: ["starting"],
      leak: 0.01,
    },
    {
      ...sym,
      key: "charge_light",
      name: "Battery charge warning lamp on",
      kind: "warning_lamp",
      synonyms: [
        "battery light on",
        "charge light",
        "charging lamp",
        "alternator light",
        "red battery symbol",
      ],
      conditions: ["engine running", "while driving"],
      leak: 0.01,
    },
    {
      ...sym,
      key: "lights_dim",
      name: "Lights dim or flicker at idle",
      kind: "electrical",
      synonyms: [
        "dim lights",
        "flickering dashboard",
        "lights pulse with the engine",
        "headlights go dim at idle",
      ],
      conditions: ["at idle", "at night"],
      leak: 0.03,
    },
    {
      ...sym,
      key: "electrics_flicker_crank",
      name: "Dashboard resets or electrics cut out when cranking or over bumps",
      kind: "electrical",
      synonyms: [
        "radio resets when starting",
        "dash goes dead over bumps",
        "all the warning lights flash when I start it",
        "clock resets",
        "electrics cut out",
      ],
      conditions: ["starting", "over bumps"],
      leak: 0.03,
    },
    {
      ...sym,
      key: "bulbs_blowing",
      name: "Bulbs keep blowing",
      kind: "electrical",
      synonyms: [
        "bulbs blow all the time",
        "headlight bulbs keep failing",
        "lights very bright",
        "replacing bulbs every month",
      ],
      conditions: ["engine running"],
      leak: 0.03,
    },
    {
      ...sym,
      key: "battery_swollen_smell",
      name: "Battery case swollen, hot or smelling of rotten eggs",
      kind: "visible",
      synonyms: [
        "battery bulging",
        "battery smells",
        "acid smell under the bonnet",
        "battery hot to the touch",
        "battery boiling",
      ],
      conditions: ["after driving"],
      leak: 0.01,
    },
  ],

  causes: [
    systemNode(
      "electrical",
      "Electrical",
      "Low-voltage (12 V) electrics: battery, charging, starting, body electrics, lighting, locking, wipers, heater blower and airbag circuits.",
    ),
    componentNode(
      "electrical",
      "elec_battery_charging",
      "Battery and charging",
      "The 12 V battery, its terminals and earth straps, and the alternator and its regulator.",
    ),
    componentNode(
      "electrical",
      "elec_starting",
      "Starting",
      "Starter motor and solenoid, their feed, and the start-inhibit switches.",
    ),
    fm("elec_battery_charging", {
      key: "battery_worn",
      name: "Battery worn out (low capacity)",
      baseRate: 7,
      repairMinutes: 20,
      partsCost: 110,
      priority: "soon",
      description:
        "The battery no longer holds enough charge: slow cranking, flat after standing, worst on cold mornings. Common after about five years.",
      ownerDescription: "The battery has worn out and can no longer hold enough charge.",
      ifLeft: "Sooner or later the car will not start, usually on a cold morning.",
    }),
    fm("elec_battery_charging", {
      key: "battery_terminals_poor",
      name: "Battery terminal loose or corroded",
      baseRate: 2,
      repairMinutes: 20,
      partsCost: 5,
      priority: "soon",
      description:
        "High resistance at a terminal clamp: clicks instead of cranking, dim lights, poor charging. Cheap to fix, easy to miss.",
      ownerDescription:
        "A battery connection is loose or corroded, so power is not getting through properly.",
      ifLeft: "The car may not start, or the electrics may cut out while driving.",
    }),
    fm("elec_battery_charging", {
      key: "earth_strap_failed",
      name: "Engine or body earth strap broken or corroded",
      baseRate: 1,
      repairMinutes: 30,
      partsCost: 15,
      priority: "soon",
      description:
        "The braided strap between engine, gearbox and body (or the battery-to-body earth) has frayed or corroded: slow cranking, flickering electrics, odd faults in several circuits.",
      ownerDescription:
        "One of the cables that connects the engine and body back to the battery has corroded or broken.",
      ifLeft:
        "Starting gets harder and electrical faults appear and disappear; current can find other paths and damage cables.",
      applicability: { minAgeYears: 8 },
    }),
    fm("elec_battery_charging", {
      key: "parasitic_drain",
      name: "Parasitic drain with the car locked",
      baseRate: 2,
      repairMinutes: 90,
      partsCost: 20,
      priority: "soon",
      description:
        "Something stays awake after locking — a module, a boot or glovebox lamp, an aftermarket accessory — and empties the battery over a few days.",
      ownerDescription:
        "Something in the car stays switched on after it is locked and slowly drains the battery.",
      ifLeft: "The battery keeps going flat, and repeated flat batteries wear it out.",
    }),
    fm("elec_battery_charging", {
      key: "alternator_not_charging",
      name: "Alternator not charging",
      baseRate: 2.5,
      repairMinutes: 90,
      partsCost: 200,
      priority: "soon",
      description:
        "Worn brushes, a failed regulator or diodes, or a slipping belt: the charge lamp comes on and the battery runs down while driving (P0562 on many cars).",
      ownerDescription:
        "The alternator, which charges the battery while the engine runs, has stopped charging.",
      ifLeft: "The car runs on the battery alone until it goes flat, and then stops, possibly on the road.",
      applicability: { fuel: [...ENGINE_DRIVEN], minKm: 100000, youngFactor: 0.3 },
    }),
    fm("elec_battery_charging", {
      key: "alternator_overcharging",
      name: "Alternator regulator over-charging",
      baseRate: 0.5,
      repairMinutes: 90,
      partsCost: 200,
      priority: "soon",
      description:
        "The voltage regulator has failed high: bulbs blow, the battery gasses, swells and smells, electronics can be damaged (P0563 on many cars).",
      ownerDescription: "The alternator is charging too hard, which overloads the battery and the bulbs.",
      ifLeft:
        "The battery can be ruined and leak acid, bulbs keep blowing and electronic parts can be damaged.",
      applicability: { fuel: [...ENGINE_DRIVEN], minKm: 100000, youngFactor: 0.3 },
    }),
    fm("elec_starting", {
      key: "starter_motor_failing",
      name: "Starter motor or solenoid failing",
      baseRate: 1.5,
      repairMinutes: 90,
      partsCost: 180,
      priority: "soon",
      description:
        "Worn solenoid contacts or brushes: a single click and no crank, or slow cranking with a good battery. Often works again after a tap.",
      ownerDescription: "The starter motor, which turns the engine to start it, is wearing out.",
      ifLeft: "It will get less reliable until one day the engine will not turn over at all.",
      applicability: { fuel: [...ENGINE_DRIVEN], minKm: 100000, youngFactor: 0.3 },
    }),
    fm("elec_starting", {
      key: "start_inhibit_fault",
      name: "Start-inhibit switch faulty (clutch pedal or gear selector)",
      baseRate: 0.8,
      repairMinutes: 45,
      partsCost: 40,
      priority: "soon",
      description:
        "The clutch-pedal switch, brake-pedal switch or gear-selector switch does not tell the car it is safe to start: nothing happens, or it starts only in one position.",
      ownerDescription:
        "A safety switch that lets the engine start only when the pedal is pressed or the gear lever is in the right place has failed.",
      ifLeft:
        "The car may refuse to start at any time; a selector switch that fails the other way could let it start in gear.",
      applicability: { fuel: COMBUSTION, minAgeYears: 5 },
    }),
  ],

  checks: [
    {
      key: "battery_rest_voltage",
      name: "Measure resting battery voltage",
      skill: "apprentice",
      minutes: 5,
      consumablesCost: 0,
      access: ["bonnet_open"],
      cautions: ["battery_acid"],
      instructions: [
        SAY.BATTERY,
        "With the car off and locked for at least an hour (or after switching headlamps on for a minute to remove surface charge), measure across the battery posts.",
        "Measure on the posts themselves, not the clamps, so a bad terminal does not hide in the reading.",
      ],
      tools: ["digital multimeter"],
      result: {
        kind: "measurement",
        quantity: "voltage",
        unit: "V",
        rule: "value >= 12.4 V", // common practice, no published source: a lead-acid battery at rest below about 12.4 V is under-charged
        gradeScale: "0.4 V", // 12.2 V is "beyond", under 12.2 V "far beyond" (about half charged or less)
        failMeans:
          "The battery is low: charge it and load-test it; then find out why it was low (drain, charging, short trips or a worn battery).",
      },
      falseAlarm: 0.08,
    },
    {
      key: "battery_conductance_test",
      name: "Test the battery with a conductance tester against its rating",
      skill: "apprentice",
      minutes: 10,
      consumablesCost: 0,
      access: ["bonnet_open"],
      cautions: ["battery_acid"],
      instructions: [
        SAY.BATTERY,
        "Enter the battery's type and rated cold-cranking current from its label, clamp the tester to the posts and run the test.",
        "Record the measured cranking ability as a percentage of the rating; charge a low battery and test again before condemning it.",
      ],
      tools: ["battery conductance tester"],
      result: {
        kind: "measurement",
        quantity: "measured cold-cranking ability as percent of rating",
        unit: "",
        rule: "value >= 70", // from memory, common practice: testers commonly advise replacement somewhere below about 60–70% of rating
        failMeans:
          "The battery has lost too much capacity: replace it, and check the charging system and drain so the new one lasts.",
      },
      falseAlarm: 0.05,
    },
    {
      key: "cranking_voltage",
      name: "Measure battery voltage while cranking",
      skill: "technician",
      minutes: 10,
      consumablesCost: 0,
      access: ["bonnet_open"],
      cautions: ["battery_acid", "rotating_parts", "exhaust_fumes"],
      instructions: [
        SAY.BATTERY + " " + SAY.RUNNING,
        "Connect the meter to the battery posts (min/max capture on), then crank or start the engine and read the lowest voltage.",
        "A battery tester's load test can be used instead; record its verdict alongside.",
      ],
      tools: ["digital multimeter with min/max", "battery tester", "exhaust extraction"],
      result: {
        kind: "measurement",
        quantity: "voltage",
        unit: "V",
        rule: "value >= 9.6 V", // common practice, from memory: about 9.6 V minimum under cranking load at around 20 °C
        gradeScale: "1 V", // under 9.1 V is "far beyond"
        failMeans:
          "The voltage collapses under load: a worn battery, or a starter drawing too much; check terminals before replacing anything.",
      },
      falseAlarm: 0.06,
    },
    {
      key: "charging_voltage",
      name: "Measure charging voltage with the engine running",
      skill: "technician",
      minutes: 10,
      consumablesCost: 0,
      access: ["bonnet_open"],
      cautions: ["battery_acid", "rotating_parts", "exhaust_fumes"],
      instructions: [
        SAY.BATTERY + " " + SAY.RUNNING,
        "Run the engine at about 2000 rpm with headlamps, heater fan and rear screen heater on; measure across the battery posts.",
        "Cars with smart charging vary the voltage on purpose: use the maker's figure and test routine for them.",
      ],
      tools: ["digital multimeter", "exhaust extraction"],
      result: {
        kind: "measurement",
        quantity: "voltage",
        unit: "V",
        rule: "value >= 13.8 V and value <= 14.8 V", // common practice, no published source; smart-charge systems are maker-specific — use the maker's figure
        failMeans:
          "The alternator is not charging (low) or over-charging (high): check the belt and wiring, then the alternator and regulator.",
      },
      falseAlarm: 0.06,
    },
    {
      key: "alternator_load_ripple",
      name: "Load-test the alternator and look for diode ripple",
      skill: "technician",
      minutes: 20,
      consumablesCost: 0,
      access: ["bonnet_open"],
      cautions: ["battery_acid", "rotating_parts", "exhaust_fumes"],
      instructions: [
        SAY.BATTERY + " " + SAY.RUNNING,
        "With a clamp ammeter on the alternator output and every large load switched on, raise the revs and read the output current; compare with the alternator's rating.",
        "Set the meter to AC volts across the battery: more than a few hundred millivolts of ripple points to a failed diode (from memory; use the tester's guidance).",
      ],
      tools: ["clamp ammeter", "digital multimeter", "exhaust extraction"],
      result: {
        kind: "pass_fail",
        failMeans: "The alternator cannot deliver its output or has diode ripple: replace or recondition it.",
      },
      falseAlarm: 0.06,
    },
    {
      key: "parasitic_draw",
      name: "Measure parasitic current draw with the car asleep",
      skill: "technician",
      minutes: 60,
      consumablesCost: 0,
      access: ["bonnet_open"],
      cautions: ["battery_acid"],
      instructions: [
        SAY.BATTERY,
        "Close doors, boot and bonnet (latch the bonnet switch by hand), lock the car and fit a clamp ammeter round the negative lead, or an ammeter in series with a bypass so modules do not wake.",
        "Wait for the modules to go to sleep — the maker gives the time, it can be 30 minutes or more — then read the current.",
        "Compare with the maker's figure where it gives one. If high, pull fuses one at a time (or measure volt drop across them) to find the circuit.",
      ],
      tools: ["low-amp clamp meter or multimeter with fused bypass lead", "fuse puller"],
      result: {
        kind: "measurement",
        quantity: "current",
        unit: "mA",
        rule: "value <= 50 mA", // common practice, from memory: asleep draws are typically 20–50 mA; maker-specific — use the maker's figure
        failMeans:
          "Something stays on with the car asleep: the fuse that drops the current names the circuit to chase.",
      },
      falseAlarm: 0.06,
    },
    {
      key: "battery_terminal_visual",
      name: "Inspect battery terminals and earth straps",
      skill: "apprentice",
      minutes: 5,
      consumablesCost: 0,
      access: ["bonnet_open"],
      cautions: ["battery_acid"],
      instructions: [
        SAY.BATTERY,
        "Try to twist each battery clamp by hand: any movement is a fail. Look for white or green corrosion and a swollen, leaking or unusually warm case.",
        "Follow the main earth straps to the body and engine and check they are tight and not frayed.",
      ],
      tools: ["inspection lamp", "gloves", "safety glasses"],
      result: {
        kind: "pass_fail",
        failMeans:
          "A terminal or earth is loose or corroded, or the battery case is damaged: clean, tighten or replace and re-test.",
      },
      falseAlarm: 0.05,
    },
    {
      key: "earth_strap_voltage_drop",
      name: "Voltage-drop test between the battery negative and the body",
      skill: "technician",
      minutes: 15,
      consumablesCost: 0,
      access: ["bonnet_open"],
      cautions: ["battery_acid", "rotating_parts", "exhaust_fumes"],
      instructions: [
        SAY.BATTERY + " " + SAY.RUNNING,
        "With the engine running and headlamps, heater fan and rear screen heater on, meter from the battery negative post to a clean point on the body, then to the engine block.",
        "Record the larger drop; look at the straps for fraying and green corrosion under the lugs.",
      ],
      tools: ["digital multimeter", "long test leads", "exhaust extraction"],
      result: {
        kind: "measurement",
        quantity: "voltage",
        unit: "V",
        rule: "value <= 0.2 V", // common practice, from memory: an earth path under load should lose no more than about 0.1–0.2 V
        failMeans:
          "Too much voltage is lost in an earth path: clean or replace the strap and its contact points.",
      },
      falseAlarm: 0.05,
    },
    {
      key: "starter_feed_voltage_drop",
      name: "Voltage-drop test on the starter feed and earth while cranking",
      skill: "technician",
      minutes: 20,
      consumablesCost: 0,
      access: ["bonnet_open"],
      cautions: ["battery_acid", "rotating_parts", "exhaust_fumes"],
      instructions: [
        SAY.BATTERY +
          " " +
          SAY.RUNNING +
          " Disable starting as the maker describes if you only need to crank.",
        "Meter from the battery positive post to the starter main terminal and crank: read the drop. Repeat from the battery negative post to the engine block.",
        "Record the larger of the two readings.",
      ],
      tools: ["digital multimeter", "long test leads", "exhaust extraction"],
      result: {
        kind: "measurement",
        quantity: "voltage",
        unit: "V",
        rule: "value <= 0.5 V", // common practice, from memory: about 0.5 V per side of the starter circuit
        failMeans:
          "Too much voltage is lost in a cable, terminal or earth: the starter is being starved; clean or replace the connection.",
      },
      falseAlarm: 0.05,
    },
    {
      key: "starter_solenoid_test",
      name: "Check the starter: solenoid supply and response",
      skill: "technician",
      minutes: 30,
      consumablesCost: 0,
      access: ["ramp", "bonnet_open"],
      cautions: ["lifting", "battery_acid", "rotating_parts"],
      instructions: [
        SAY.BATTERY + " " + SAY.LIFT + " Gearbox in neutral or park, nobody near the belt or wheels.",
        "With a helper turning the key or pressing start, check for battery voltage at the solenoid trigger terminal.",
        "Voltage present with a good main feed but no crank (or just a click) means the starter has failed.",
      ],
      tools: ["digital multimeter", "test lamp"],
      result: {
        kind: "pass_fail",
        failMeans: "The starter gets its signal and feed but does not turn: replace the starter motor.",
      },
      falseAlarm: 0.04,
    },
    {
      key: "start_inhibit_test",
      name: "Check the clutch, brake and selector start switches",
      skill: "technician",
      minutes: 20,
      consumablesCost: 0,
      access: ["scan_tool"],
      cautions: [],
      instructions: [
        "With the scan tool showing the clutch-pedal, brake-pedal and selector switch states, press each pedal and move the selector: each state should change cleanly at the right point.",
        "If the state does not change, check the switch's adjustment and plug before replacing it. Never bridge a start-inhibit switch to get a car going.",
      ],
      tools: ["scan tool", "multimeter"],
      result: {
        kind: "pass_fail",
        failMeans: "A start-inhibit switch does not switch: adjust or replace it.",
      },
      falseAlarm: 0.04,
    },
    {
      key: "electrical_fault_memory",
      name: "Read body and charging fault memory with a scan tool",
      skill: "technician",
      minutes: 10,
      consumablesCost: 0,
      access: ["scan_tool"],
      cautions: [],
      instructions: [
        "Connect the scan tool and read every module that reports body, lighting, door, locking and charging faults; note codes before clearing.",
        "Look at the battery monitoring and window or door module data where the tool shows them.",
      ],
      tools: ["scan tool"],
      result: {
        kind: "pass_fail",
        failMeans: "A stored fault names the circuit: lamp, window, door, lock or charging.",
      },
      falseAlarm: 0.1,
    },
  ],

  symptomLinks: [
    ...producesSymptoms("battery_worn", {
      battery_flat: 0.6,
      slow_crank: 0.75,
      no_crank: 0.35,
      hard_cold_start: 0.2,
      electrics_flicker_crank: 0.2,
    }),
    ...producesSymptoms("battery_terminals_poor", {
      no_crank: 0.5,
      slow_crank: 0.4,
      lights_dim: 0.3,
      battery_flat: 0.3,
      charge_light: 0.15,
      electrics_flicker_crank: 0.4,
    }),
    ...producesSymptoms("earth_strap_failed", {
      electrics_flicker_crank: 0.6,
      slow_crank: 0.4,
      lights_dim: 0.3,
      no_crank: 0.3,
    }),
    ...producesSymptoms("parasitic_drain", { battery_flat: 0.9, no_crank: 0.3, slow_crank: 0.3 }),
    ...producesSymptoms("alternator_not_charging", {
      charge_light: 0.8,
      battery_flat: 0.5,
      lights_dim: 0.5,
      slow_crank: 0.3,
    }),
    ...producesSymptoms("alternator_overcharging", {
      bulbs_blowing: 0.6,
      battery_swollen_smell: 0.6,
      charge_light: 0.4,
    }),
    ...producesSymptoms("starter_motor_failing", { no_crank: 0.75, slow_crank: 0.35 }),
    ...producesSymptoms("start_inhibit_fault", { no_crank: 0.7, starts_only_in_neutral: 0.8 }),
  ],

  checkLinks: [
    ...bearsOn("battery_rest_voltage", {
      battery_worn: 0.6,
      parasitic_drain: 0.7,
      alternator_not_charging: 0.6,
      battery_terminals_poor: 0.2,
    }),
    ...gradedOn("battery_conductance_test", {
      battery_worn: { well_within: 0.05, near: 0.1, beyond: 0.5, far_beyond: 0.35 },
    }),
    ...bearsOn("cranking_voltage", {
      battery_terminals_poor: 0.5,
      starter_motor_failing: 0.3,
      earth_strap_failed: 0.3,
    }),
    ...gradedOn("cranking_voltage", {
      battery_worn: { well_within: 0.05, near: 0.1, beyond: 0.45, far_beyond: 0.4 },
    }),
    ...bearsOn("charging_voltage", { battery_terminals_poor: 0.25, aux_belt_worn: 0.3 }),
    // A dead alternator reads battery voltage, far below the window; a slipping belt just below it.
    ...gradedOn("charging_voltage", {
      alternator_not_charging: { well_within: 0.03, near: 0.12, beyond: 0.25, far_beyond: 0.6 },
      alternator_overcharging: { well_within: 0.04, near: 0.06, beyond: 0.4, far_beyond: 0.5 },
    }),
    ...bearsOn("alternator_load_ripple", { alternator_not_charging: 0.75 }),
    ...gradedOn("parasitic_draw", {
      parasitic_drain: { well_within: 0.02, near: 0.08, beyond: 0.3, far_beyond: 0.6 },
    }),
    ...bearsOn("battery_terminal_visual", {
      battery_terminals_poor: 0.85,
      earth_strap_failed: 0.5,
      alternator_overcharging: 0.3,
    }),
    ...bearsOn("earth_strap_voltage_drop", { earth_strap_failed: 0.85, battery_terminals_poor: 0.4 }),
    ...bearsOn("starter_feed_voltage_drop", {
      battery_terminals_poor: 0.7,
      starter_motor_failing: 0.35,
      earth_strap_failed: 0.7,
    }),
    ...bearsOn("starter_solenoid_test", { starter_motor_failing: 0.85, start_inhibit_fault: 0.4 }),
    ...bearsOn("start_inhibit_test", { start_inhibit_fault: 0.85 }),
    ...bearsOn("electrical_fault_memory", {
      elec_battery_charging: 0.35,
      elec_windows: 0.3,
      elec_lighting: 0.5,
      elec_locking: 0.4,
      elec_ancillaries: 0.3,
    }),
  ],
};
