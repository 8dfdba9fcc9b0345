// Benchmark cases whose true cause is deliberately NOT in the starter knowledge base: a plausible
// fault a workshop meets that nobody has written down yet. The right answer is "not in the
// knowledge base": the engine should say "none of these" rather than push an unrelated cause.
// A code the base does not list by itself is meant as the generic "trouble code stored" symptom.
import { bench, car, fail, missing, owner, pass, read, tech, type BenchCase } from "./case-types";

export const missingCauseCases: BenchCase[] = [
  bench(
    "missing-aircon-compressor",
    "electrical",
    car("petrol", "fwd", 8, 94_000),
    [
      owner("air con only blows warm air", null),
      owner("loud click from the engine when I switch the air con on", null),
      tech("no overheating", "overheat_traffic", false),
    ],
    [pass("aux_belt_inspect")],
    missing("air-conditioning compressor clutch failed"),
  ),
  bench(
    "missing-fuel-sender",
    "engine_fuel_emissions",
    car("petrol", "fwd", 12, 139_000),
    [
      owner("fuel gauge says empty with half a tank in", null),
      tech("no engine light", "check_engine_light", false),
    ],
    [],
    missing("fuel tank sender unit worn"),
  ),
  bench(
    "missing-knock-sensor",
    "engine_fuel_emissions",
    car("petrol", "fwd", 10, 127_000),
    [
      tech("P0325", "trouble_code_stored"),
      owner("engine light on", "check_engine_light"),
      owner("feels down on power", "loss_of_power"),
      tech("no misfire", "misfire_load", false),
    ],
    [
      pass("misfire_counters_coil_swap"),
      pass("spark_plug_inspect"),
      pass("maf_live_reading"),
      read("long_term_fuel_trim", "3"),
    ],
    missing("knock sensor or its wiring faulty"),
  ),
  bench(
    "missing-air-temp-sensor",
    "engine_fuel_emissions",
    car("petrol", "fwd", 9, 102_000),
    [
      tech("P0113", "trouble_code_stored"),
      owner("engine management light came on", "check_engine_light"),
      tech("no loss of power", "loss_of_power", false),
    ],
    [pass("maf_live_reading"), pass("air_filter_inspect")],
    missing("intake air temperature sensor open circuit"),
  ),
  bench(
    "missing-rear-drop-link",
    "suspension_steering",
    car("petrol", "fwd", 9, 108_000),
    [
      owner("knock from the back over speed bumps", "clunk_rear_bumps"),
      tech("car doesn't bounce", "bouncy_ride", false),
    ],
    [pass("rear_suspension_play"), pass("damper_bounce_visual"), pass("spring_ride_height")],
    missing("rear anti-roll bar link worn"),
  ),
  bench(
    "missing-ignition-switch",
    "electrical",
    car("petrol", "fwd", 15, 176_000),
    [
      owner("sometimes nothing at all happens when I turn the key", "no_crank"),
      owner("the key feels loose in the ignition", null),
      tech("no slow cranking", "slow_crank", false),
    ],
    [
      read("battery_conductance_test", "91"),
      pass("battery_terminal_visual"),
      read("cranking_voltage", "10.6 V"),
      pass("starter_solenoid_test"),
      pass("start_inhibit_test"),
    ],
    missing("ignition switch contacts worn"),
  ),
  bench(
    "missing-hybrid-dcdc",
    "electrical",
    car("hybrid", "fwd", 9, 142_000),
    [
      owner("the little twelve volt battery keeps going flat", "battery_flat"),
      tech("no battery light", "charge_light", false),
    ],
    [
      read("battery_conductance_test", "84"),
      read("parasitic_draw", "25 mA"),
      pass("battery_terminal_visual"),
    ],
    missing("hybrid 12 V DC-DC converter not charging"),
  ),
  bench(
    "missing-rear-wiper",
    "electrical",
    car("petrol", "fwd", 10, 118_000),
    [
      owner("rear wiper has stopped working", "wipers_dead_slow"),
      tech("no knocking from the wipers", "wiper_knock", false),
    ],
    [pass("wiper_motor_test"), pass("wiper_linkage_inspect"), pass("accessory_fuse_check")],
    missing("rear wiper motor seized"),
  ),
  bench(
    "missing-lock-barrel",
    "body",
    car("petrol", "fwd", 14, 161_000),
    [
      owner("key won't turn in the driver's door lock", null),
      tech("no trouble with the key fob", "fob_range_poor", false),
    ],
    [pass("lock_actuator_test"), read("fob_battery_test", "3.0 V")],
    missing("door lock barrel seized"),
  ),
  bench(
    "missing-flat-spotted-tyres",
    "wheels_tyres",
    car("petrol", "rwd", 7, 44_000),
    [
      owner("vibration at motorway speed since the car was laid up all winter", "vibration_speed"),
      tech("no wobble at low speed", "wobble_low_speed", false),
    ],
    [
      read("wheel_balance", "3 g"),
      read("rim_runout", "0.4 mm"),
      pass("wheel_nut_torque"),
      pass("suspension_play_ramp"),
    ],
    missing("tyres flat-spotted from standing"),
  ),
  bench(
    "missing-alternator-pulley",
    "engine_mechanical",
    car("diesel", "fwd", 9, 148_000),
    [
      owner("rattle from the belt end at idle", "front_engine_whirr"),
      owner("battery light flickers at tickover", "charge_light"),
      tech("no belt squeal", "belt_squeal", false),
    ],
    [
      pass("tensioner_pulley_spin"),
      pass("aux_belt_inspect"),
      read("charging_voltage", "14.1 V"),
      pass("water_pump_check"),
    ],
    missing("alternator overrunning pulley worn"),
  ),
  bench(
    "missing-heated-rear-screen",
    "electrical",
    car("petrol", "fwd", 11, 121_000),
    [owner("heated rear window doesn't clear any more", null)],
    [pass("accessory_fuse_check")],
    missing("heated rear window element broken"),
  ),
  bench(
    "missing-swirl-flaps",
    "engine_fuel_emissions",
    car("diesel", "fwd", 12, 189_000),
    [
      owner("engine light came on", "check_engine_light"),
      owner("it's gone sluggish", "loss_of_power"),
      tech("P2015", "trouble_code_stored"),
      tech("no black smoke", "black_smoke", false),
    ],
    [
      pass("egr_command_test"),
      read("boost_pressure_log", "98"),
      pass("boost_leak_test"),
      fail("engine_fault_memory"),
    ],
    missing("intake swirl-flap actuator faulty"),
  ),
];
