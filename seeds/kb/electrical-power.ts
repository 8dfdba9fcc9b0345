// Electrical, part 1: battery, charging and starting. Part 2 (windows, lighting) is electrical-body.ts.
import { bearsOn, componentNode, failureMode, producesSymptoms, systemNode } from "./build";
import type { KnowledgeBaseSeed } from "./types";

const fm = (parent: string, f: Parameters<typeof failureMode>[2]) => failureMode("electrical", parent, f);
const BATTERY = "Follow the vehicle maker's procedure for battery work: glasses and gloves (battery acid), no sparks or flames near the battery, and if a lead must come off, the negative comes off first and goes back last.";

export const electricalPower: KnowledgeBaseSeed = {
  symptoms: [
    { key: "battery_flat", name: "Battery flat after standing", system: "electrical", kind: "electrical",
      synonyms: ["flat battery", "dead battery", "won't start after a few days", "needs a jump start", "battery keeps going flat"],
      conditions: ["after standing", "cold morning"], leak: 0.05 }, // lights left on and very short trips are the usual leak
    { key: "no_crank", name: "Engine won't crank (click or nothing)", system: "electrical", kind: "electrical",
      synonyms: ["won't start", "no crank", "just clicks", "nothing happens when I turn the key", "starter doesn't turn", "dead when I press start"],
      conditions: ["starting"], leak: 0.02 },
    { key: "slow_crank", name: "Slow cranking, worse when cold", system: "electrical", kind: "electrical",
      synonyms: ["turns over slowly", "labouring to start", "weak start", "struggles to turn over"],
      conditions: ["starting", "cold morning"], leak: 0.03 },
    { key: "charge_light", name: "Battery charge warning light on", system: "electrical", kind: "warning_light",
      synonyms: ["battery light on", "charge light", "alternator light", "red battery symbol"],
      conditions: ["engine running", "while driving"], leak: 0.01 },
    { key: "lights_dim", name: "Lights dim or flicker at idle", system: "electrical", kind: "electrical",
      synonyms: ["dim lights", "flickering dashboard", "lights pulse with the engine", "headlights go dim at idle"],
      conditions: ["at idle", "at night"], leak: 0.03 },
  ],

  causes: [
    systemNode("electrical", "Electrical", "Low-voltage (12 V) electrics: battery, charging, starting, body electrics and lighting."),
    componentNode("electrical", "elec_battery_charging", "Battery and charging", "The 12 V battery, its terminals and earth straps, and the alternator."),
    componentNode("electrical", "elec_starting", "Starting", "Starter motor and solenoid and their feed."),
    fm("elec_battery_charging", { key: "battery_worn", name: "Battery worn out (low capacity)", baseRate: 7, repairMinutes: 20, partsCost: 110, priority: "soon",
      description: "The battery no longer holds enough charge: slow cranking, flat after standing, worst on cold mornings. Common after about five years." }),
    fm("elec_battery_charging", { key: "battery_terminals_poor", name: "Battery terminal or earth strap loose or corroded", baseRate: 2, repairMinutes: 20, partsCost: 5, priority: "soon",
      description: "High resistance at a terminal or earth: clicks instead of cranking, dim lights, poor charging. Cheap to fix, easy to miss." }),
    fm("elec_battery_charging", { key: "parasitic_drain", name: "Parasitic drain with the car locked", baseRate: 2, repairMinutes: 90, partsCost: 20, priority: "soon",
      description: "Something stays awake after locking — a module, a boot or glovebox lamp, an aftermarket accessory — and empties the battery over a few days." }),
    fm("elec_battery_charging", { key: "alternator_not_charging", name: "Alternator not charging", baseRate: 2.5, repairMinutes: 90, partsCost: 200, priority: "soon",
      description: "Worn brushes, a failed regulator or diodes, or a slipping belt: the charge light comes on and the battery runs down while driving.",
      applicability: { fuel: ["petrol", "diesel", "lpg"], minKm: 100000, youngFactor: 0.3 } }),
    fm("elec_starting", { key: "starter_motor_failing", name: "Starter motor or solenoid failing", baseRate: 1.5, repairMinutes: 90, partsCost: 180, priority: "soon",
      description: "Worn solenoid contacts or brushes: a single click and no crank, or slow cranking with a good battery. Often works again after a tap.",
      applicability: { fuel: ["petrol", "diesel", "lpg"], minKm: 100000, youngFactor: 0.3 } }),
  ],

  checks: [
    { key: "battery_rest_voltage", name: "Measure resting battery voltage", skill: "apprentice", minutes: 5, consumablesCost: 0,
      access: ["bonnet_open"], cautions: ["battery_acid"],
      instructions: [
        BATTERY,
        "With the car off and locked for at least an hour (or after switching headlamps on for a minute to remove surface charge), measure across the battery posts.",
        "Measure on the posts themselves, not the clamps, so a bad terminal does not hide in the reading.",
      ],
      tools: ["digital multimeter"],
      result: { kind: "measurement", quantity: "voltage", unit: "V",
        rule: "value >= 12.4 V", // common practice, no published source: a lead-acid battery at rest below about 12.4 V is under-charged
        failMeans: "The battery is low: charge it and load-test it; then find out why it was low (drain, charging, short trips or a worn battery)." },
      falseAlarm: 0.08 },
    { key: "cranking_voltage", name: "Measure battery voltage while cranking", skill: "technician", minutes: 10, consumablesCost: 0,
      access: ["bonnet_open"], cautions: ["battery_acid", "rotating_parts", "exhaust_fumes"],
      instructions: [
        BATTERY + " Exhaust extraction connected; keep hands clear of the belt and fan.",
        "Connect the meter to the battery posts (min/max capture on), then crank or start the engine and read the lowest voltage.",
        "A battery tester's load or conductance test can be used instead; record its verdict alongside.",
      ],
      tools: ["digital multimeter with min/max", "battery tester", "exhaust extraction"],
      result: { kind: "measurement", quantity: "voltage", unit: "V",
        rule: "value >= 9.6 V", // common practice, from memory: about 9.6 V minimum under cranking load at around 20 °C
        failMeans: "The voltage collapses under load: a worn battery, or a starter drawing too much; check terminals before replacing anything." },
      falseAlarm: 0.06 },
    { key: "charging_voltage", name: "Measure charging voltage with the engine running", skill: "technician", minutes: 10, consumablesCost: 0,
      access: ["bonnet_open"], cautions: ["battery_acid", "rotating_parts", "exhaust_fumes"],
      instructions: [
        BATTERY + " Exhaust extraction connected; keep hands and leads clear of the belt and fan.",
        "Run the engine at about 2000 rpm with headlamps, heater fan and rear screen heater on; measure across the battery posts.",
        "Cars with smart charging vary the voltage on purpose: use the maker's figure and test routine for them.",
      ],
      tools: ["digital multimeter", "exhaust extraction"],
      result: { kind: "measurement", quantity: "voltage", unit: "V",
        rule: "value >= 13.8 V and value <= 14.8 V", // common practice, no published source; smart-charge systems are maker-specific — use the maker's figure
        failMeans: "The alternator is not charging (low) or over-charging (high): check the belt and wiring, then the alternator and regulator." },
      falseAlarm: 0.06 },
    { key: "parasitic_draw", name: "Measure parasitic current draw with the car asleep", skill: "technician", minutes: 60, consumablesCost: 0,
      access: ["bonnet_open"], cautions: ["battery_acid"],
      instructions: [
        BATTERY,
        "Close doors, boot and bonnet (latch the bonnet switch by hand), lock the car and fit a clamp ammeter round the negative lead, or an ammeter in series with a bypass so modules do not wake.",
        "Wait for the modules to go to sleep — the maker gives the time, it can be 30 minutes or more — then read the current.",
        "Compare with the maker's figure where it gives one. If high, pull fuses one at a time (or measure volt drop across them) to find the circuit.",
      ],
      tools: ["low-amp clamp meter or multimeter with fused bypass lead", "fuse puller"],
      result: { kind: "measurement", quantity: "current", unit: "mA",
        rule: "value <= 50 mA", // common practice, from memory: asleep draws are typically 20–50 mA; maker-specific — use the maker's figure
        failMeans: "Something stays on with the car asleep: the fuse that drops the current names the circuit to chase." },
      falseAlarm: 0.06 },
    { key: "battery_terminal_visual", name: "Inspect battery terminals and earth straps", skill: "apprentice", minutes: 5, consumablesCost: 0,
      access: ["bonnet_open"], cautions: ["battery_acid"],
      instructions: [
        BATTERY,
        "Try to twist each battery clamp by hand: any movement is a fail. Look for white or green corrosion and a swollen or leaking case.",
        "Follow the main earth straps to the body and engine and check they are tight and not frayed.",
      ],
      tools: ["inspection lamp", "gloves", "safety glasses"],
      result: { kind: "pass_fail", failMeans: "A terminal or earth is loose or corroded: clean, tighten and re-test before condemning anything else." },
      falseAlarm: 0.05 },
    { key: "starter_feed_voltage_drop", name: "Voltage-drop test on the starter feed and earth while cranking", skill: "technician", minutes: 20, consumablesCost: 0,
      access: ["bonnet_open"], cautions: ["battery_acid", "rotating_parts", "exhaust_fumes"],
      instructions: [
        BATTERY + " Disable starting as the maker describes if you only need to crank; if the engine may start, connect exhaust extraction; keep clear of the belt and fan.",
        "Meter from the battery positive post to the starter main terminal and crank: read the drop. Repeat from the battery negative post to the engine block.",
        "Record the larger of the two readings.",
      ],
      tools: ["digital multimeter", "long test leads"],
      result: { kind: "measurement", quantity: "voltage", unit: "V",
        rule: "value <= 0.5 V", // common practice, from memory: about 0.5 V per side of the starter circuit
        failMeans: "Too much voltage is lost in a cable, terminal or earth: the starter is being starved; clean or replace the connection." },
      falseAlarm: 0.05 },
    { key: "starter_solenoid_test", name: "Check the starter: solenoid supply and response", skill: "technician", minutes: 30, consumablesCost: 0,
      access: ["ramp", "bonnet_open"], cautions: ["lifting", "battery_acid", "rotating_parts"],
      instructions: [
        BATTERY + " On the ramp use the maker's lifting points and ramp locks. Gearbox in neutral or park, nobody near the belt or wheels.",
        "With a helper turning the key or pressing start, check for battery voltage at the solenoid trigger terminal.",
        "Voltage present with a good main feed but no crank (or just a click) means the starter has failed.",
      ],
      tools: ["digital multimeter", "test lamp"],
      result: { kind: "pass_fail", failMeans: "The starter gets its signal and feed but does not turn: replace the starter motor." },
      falseAlarm: 0.04 },
    { key: "electrical_fault_memory", name: "Read body and charging fault memory with a scan tool", skill: "technician", minutes: 10, consumablesCost: 0,
      access: ["scan_tool"], cautions: [],
      instructions: [
        "Connect the scan tool and read every module that reports body, lighting, door and charging faults; note codes before clearing.",
        "Look at the battery monitoring and window or door module data where the tool shows them.",
      ],
      tools: ["scan tool"],
      result: { kind: "pass_fail", failMeans: "A stored fault names the circuit: lamp, window, door or charging." },
      falseAlarm: 0.1 },
  ],

  symptomLinks: [
    ...producesSymptoms("battery_worn", { battery_flat: 0.6, slow_crank: 0.75, no_crank: 0.35, hard_cold_start: 0.2 }),
    ...producesSymptoms("battery_terminals_poor", { no_crank: 0.5, slow_crank: 0.4, lights_dim: 0.3, battery_flat: 0.3, charge_light: 0.15 }),
    ...producesSymptoms("parasitic_drain", { battery_flat: 0.9, no_crank: 0.3, slow_crank: 0.3 }),
    ...producesSymptoms("alternator_not_charging", { charge_light: 0.8, battery_flat: 0.5, lights_dim: 0.5, slow_crank: 0.3 }),
    ...producesSymptoms("starter_motor_failing", { no_crank: 0.75, slow_crank: 0.35 }),
  ],

  checkLinks: [
    ...bearsOn("battery_rest_voltage", { battery_worn: 0.6, parasitic_drain: 0.7, alternator_not_charging: 0.6, battery_terminals_poor: 0.2 }),
    ...bearsOn("cranking_voltage", { battery_worn: 0.85, battery_terminals_poor: 0.5, starter_motor_failing: 0.3 }),
    ...bearsOn("charging_voltage", { alternator_not_charging: 0.85, battery_terminals_poor: 0.25 }),
    ...bearsOn("parasitic_draw", { parasitic_drain: 0.9 }),
    ...bearsOn("battery_terminal_visual", { battery_terminals_poor: 0.85 }),
    ...bearsOn("starter_feed_voltage_drop", { battery_terminals_poor: 0.7, starter_motor_failing: 0.35 }),
    ...bearsOn("starter_solenoid_test", { starter_motor_failing: 0.85 }),
    ...bearsOn("electrical_fault_memory", { elec_battery_charging: 0.35, elec_windows: 0.3, elec_lighting: 0.5 }),
  ],
};
