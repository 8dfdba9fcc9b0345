// Benchmark cases: cooling, electrical, exhaust and body. Invented cars and people.
import { bench, car, cause, fail, owner, pass, read, tech, type BenchCase } from "./case-types";

export const bodySystemCases: BenchCase[] = [
  // ---- cooling ----
  bench(
    "cool-thermostat-open",
    "cooling",
    car("petrol", "fwd", 9, 116_000),
    [
      owner("heater only ever blows lukewarm", "heater_cold"),
      owner("temperature needle hardly moves off the bottom", "temp_gauge_wrong"),
      owner("using more petrol than it used to", "high_fuel_consumption"),
      tech("never overheats in traffic", "overheat_traffic", false),
    ],
    [read("warm_up_temperature", "62 degC")],
    cause("thermostat_stuck_open"),
  ),
  bench(
    "cool-fan-dead",
    "cooling",
    car("petrol", "fwd", 10, 104_000),
    [
      owner("temperature goes into the red sitting in traffic", "overheat_traffic"),
      owner("doesn't get hot on the motorway", "overheat_load", false),
    ],
    [fail("fan_switch_on"), fail("fan_circuit_test")],
    cause("fan_not_running"),
  ),
  bench(
    "cool-hose-leak",
    "cooling",
    car("diesel", "fwd", 8, 117_000),
    [
      owner("green puddle under the front of the car", "coolant_loss"),
      owner("sweet smell from the bonnet after a run", "coolant_smell"),
      tech("no bubbles in the coolant tank", "bubbles_expansion_tank", false),
    ],
    [fail("coolant_level_leak_visual"), fail("cooling_pressure_test")],
    cause("coolant_leak_external"),
  ),
  bench(
    "cool-air-lock",
    "cooling",
    car("petrol", "fwd", 6, 69_000),
    [
      owner("gurgling behind the dash when I pull off", "gurgle_dashboard"),
      owner("heater goes cold now and then", "heater_cold"),
      tech("coolant was changed at the last service", null),
      tech("no coolant leaks", "coolant_loss", false),
    ],
    [fail("bleed_cooling_system")],
    cause("cooling_air_lock"),
  ),
  bench(
    "cool-heater-matrix",
    "cooling",
    car("petrol", "fwd", 14, 171_000),
    [
      owner("windscreen steams up with a greasy film", "misted_screen"),
      owner("sweet sickly smell inside the car", "coolant_smell"),
      owner("passenger footwell carpet is damp", "water_in_footwell"),
      tech("no white smoke from the exhaust", "white_smoke", false),
    ],
    [fail("cabin_damp_check"), fail("cooling_pressure_test")],
    cause("heater_matrix_leak"),
  ),
  bench(
    "cool-blend-flap",
    "cooling",
    car("petrol", "fwd", 7, 81_000),
    [
      owner("heater's hot on my side and cold on the passenger side", "heater_one_side"),
      tech("not losing coolant", "coolant_loss", false),
    ],
    [fail("blend_flap_test")],
    cause("heater_blend_flap_stuck"),
  ),
  bench(
    "cool-gauge-sender",
    "cooling",
    car("petrol", "rwd", 16, 204_000),
    [
      owner("temp gauge jumps all over the place", "temp_gauge_wrong"),
      tech("doesn't overheat in traffic", "overheat_traffic", false),
    ],
    [fail("ect_vs_gauge_compare"), fail("gauge_sender_test")],
    cause("gauge_sender_faulty"),
  ),
  bench(
    "cool-water-pump",
    "cooling",
    car("diesel", "fwd", 11, 163_000),
    [
      owner("whirring from the front of the engine", "front_engine_whirr"),
      owner("coolant level dropping slowly", "coolant_loss"),
      tech("no white smoke", "white_smoke", false),
    ],
    [fail("water_pump_check")],
    cause("water_pump_worn"),
  ),
  bench(
    "cool-thermostat-shut",
    "cooling",
    car("petrol", "fwd", 5, 62_000),
    [
      owner("overheating going up long hills", "overheat_load"),
      owner("temperature warning light came on", "coolant_temp_lamp"),
      tech("no coolant on the floor", "coolant_loss", false),
    ],
    [fail("radiator_ir_scan"), pass("fan_switch_on")],
    cause("thermostat_stuck_closed"),
  ),

  // ---- electrical ----
  bench(
    "elec-battery-worn",
    "electrical",
    car("petrol", "fwd", 6, 68_000),
    [
      owner("struggles to turn over on cold mornings", "slow_crank"),
      owner("battery went flat after a week at the airport", "battery_flat"),
      tech("no battery light", "charge_light", false),
    ],
    [read("battery_conductance_test", "48"), read("cranking_voltage", "8.9 V")],
    cause("battery_worn"),
  ),
  bench(
    "elec-alternator",
    "electrical",
    car("diesel", "fwd", 11, 172_000),
    [
      owner("battery light on while I'm driving", "charge_light"),
      owner("headlights go dim at tickover", "lights_dim"),
      tech("doesn't crank slowly", "slow_crank", false),
    ],
    [read("charging_voltage", "12.3 V")],
    cause("alternator_not_charging"),
  ),
  bench(
    "elec-parasitic-drain",
    "electrical",
    car("petrol", "fwd", 7, 83_000),
    [
      owner("it's flat every time it sits for a few days", "battery_flat"),
      tech("no battery warning light", "charge_light", false),
    ],
    [read("battery_conductance_test", "88"), read("parasitic_draw", "320 mA")],
    cause("parasitic_drain"),
  ),
  bench(
    "elec-battery-terminal",
    "electrical",
    car("petrol", "fwd", 9, 97_000),
    [
      owner("just clicks when I turn the key", "no_crank"),
      owner("dash flickers when I try to start it", "electrics_flicker_crank"),
      tech("lights don't dim at idle", "lights_dim", false),
    ],
    [fail("battery_terminal_visual")],
    cause("battery_terminals_poor"),
  ),
  bench(
    "elec-window-lockout",
    "electrical",
    car("petrol", "fwd", 4, 39_000),
    [
      owner("rear windows only go down using the driver's buttons", "rear_windows_driver_only"),
      tech("driver's window isn't slow", "window_slow_stuck", false),
    ],
    [fail("window_lock_switch")],
    cause("window_lock_on"),
  ),
  bench(
    "elec-window-fuse",
    "electrical",
    car("diesel", "fwd", 8, 102_000),
    [
      owner("none of the windows go up or down", "all_windows_dead"),
      tech("no windows slow or stuck", "window_slow_stuck", false),
    ],
    [fail("window_fuse_check")],
    cause("window_fuse_blown"),
  ),
  bench(
    "elec-window-regulator",
    "electrical",
    car("petrol", "fwd", 10, 121_000),
    [
      owner("driver's window goes down slowly with a grinding noise", "window_slow_stuck"),
      tech("the other windows aren't dead", "all_windows_dead", false),
    ],
    [fail("window_motor_direct")],
    cause("window_regulator_motor"),
  ),
  bench(
    "elec-headlamp-bulb",
    "electrical",
    car("petrol", "fwd", 5, 58_000),
    [
      owner("one headlight not working", "headlamp_out"),
      owner("bulb warning on the dash", "lamp_warning"),
      tech("no water inside the lamp", "lamp_misted", false),
    ],
    [fail("headlamp_bulb_check")],
    cause("headlamp_bulb_failed"),
  ),
  bench(
    "elec-fob-battery",
    "electrical",
    car("hybrid", "fwd", 6, 77_000),
    [
      owner("key fob only works when I'm right next to the car", "fob_range_poor"),
      tech("key isn't refused by the immobiliser", "key_not_recognised", false),
    ],
    [read("fob_battery_test", "2.4 V")],
    cause("key_fob_battery_flat"),
  ),
  bench(
    "elec-clock-spring",
    "electrical",
    car("petrol", "fwd", 11, 133_000),
    [
      owner("airbag warning light is on", "airbag_lamp"),
      owner("horn stopped working", "horn_dead"),
      tech("steering wheel buttons aren't dead", "wheel_buttons_dead", false),
    ],
    [fail("airbag_fault_memory"), fail("clock_spring_test")],
    cause("clock_spring_failed"),
  ),
  bench(
    "elec-blower-resistor",
    "electrical",
    car("petrol", "fwd", 9, 99_000),
    [
      owner("fan only works on the highest setting", "blower_top_speed_only"),
      tech("blower doesn't squeal", "blower_dead_noisy", false),
    ],
    [fail("blower_speed_test")],
    cause("blower_resistor_failed"),
  ),
  bench(
    "elec-brake-light-switch",
    "electrical",
    car("petrol", "fwd", 8, 91_000),
    [
      owner("brake lights stay on all the time", "brake_lamps_fault"),
      tech("no stability control light", "esc_lamp", false),
    ],
    [fail("brake_light_switch_test")],
    cause("brake_light_switch_faulty"),
  ),

  // ---- exhaust ----
  bench(
    "exh-manifold",
    "exhaust",
    car("petrol", "fwd", 10, 131_000),
    [
      owner("ticking from the engine when cold that goes once it's warm", "exhaust_tick_cold"),
      tech("no exhaust smell inside the car", "exhaust_fumes_cabin", false),
    ],
    [fail("exhaust_cold_listen"), fail("exhaust_smoke_test")],
    cause("manifold_leak"),
  ),
  bench(
    "exh-back-box",
    "exhaust",
    car("petrol", "fwd", 12, 144_000),
    [
      owner("exhaust sounds like a tractor", "exhaust_loud"),
      tech("no rattle from the silencer", "rattle_exhaust_box", false),
    ],
    [fail("exhaust_visual_ramp")],
    cause("silencer_corroded"),
  ),
  bench(
    "exh-heat-shield",
    "exhaust",
    car("petrol", "fwd", 9, 112_000),
    [
      owner("tinny rattle underneath at about 2000 revs", "buzz_at_revs"),
      tech("no knock underneath over bumps", "rattle_underneath", false),
    ],
    [fail("exhaust_tap_test")],
    cause("heat_shield_loose"),
  ),
  bench(
    "exh-catalyst",
    "exhaust",
    car("petrol", "fwd", 13, 176_000),
    [
      tech("P0420", "dtc_p0420"),
      owner("engine light's on", "check_engine_light"),
      owner("smells of rotten eggs", "rotten_egg_smell"),
      tech("no loss of power", "loss_of_power", false),
    ],
    [fail("catalyst_sensor_compare"), pass("downstream_o2_check")],
    cause("catalyst_inefficient"),
  ),
  bench(
    "exh-hanger",
    "exhaust",
    car("diesel", "fwd", 8, 109_000),
    [
      owner("clonking from under the car over bumps", "rattle_underneath"),
      tech("no buzz at certain revs", "buzz_at_revs", false),
    ],
    [fail("exhaust_tap_test"), fail("exhaust_visual_ramp")],
    cause("hanger_broken"),
  ),
  bench(
    "exh-dpf",
    "exhaust",
    car("diesel", "fwd", 5, 61_000),
    [
      owner("DPF light on", "dpf_light"),
      owner("I only do short school runs", null),
      tech("P2463", "dtc_p2463"),
      tech("no black smoke", "black_smoke", false),
    ],
    [fail("dpf_pressure_read")],
    cause("dpf_blocked"),
  ),

  // ---- body ----
  bench(
    "body-child-lock",
    "body",
    car("petrol", "fwd", 3, 29_000),
    [
      owner("back door won't open from the inside", "door_wont_open_inside"),
      tech("no problem opening it from the outside", "door_wont_open_outside", false),
    ],
    [fail("child_lock_check")],
    cause("child_lock_on"),
  ),
  bench(
    "body-tailgate-struts",
    "body",
    car("petrol", "fwd", 9, 97_000),
    [
      owner("boot lid won't stay up, nearly hit my head", "boot_wont_stay_up"),
      tech("no trouble opening the boot", "boot_wont_open", false),
    ],
    [fail("tailgate_strut_check")],
    cause("tailgate_struts_weak"),
  ),
  bench(
    "body-sunroof-drain",
    "body",
    car("petrol", "fwd", 8, 88_000),
    [
      owner("water dripping from the roof lining after rain", "water_from_headlining"),
      tech("no water in the footwells", "water_in_footwell", false),
    ],
    [fail("sunroof_drain_test")],
    cause("sunroof_drain_blocked"),
  ),
  bench(
    "body-door-drain",
    "body",
    car("petrol", "fwd", 11, 126_000),
    [
      owner("sloshing noise inside the door when I brake", "water_in_door"),
      tech("no wind noise from the door", "wind_noise_door", false),
    ],
    [fail("door_drain_clear")],
    cause("door_drain_blocked"),
  ),
  bench(
    "body-arch-liner",
    "body",
    car("petrol", "fwd", 7, 76_000),
    [
      owner("tyre rubbing on something on full lock", "liner_rubbing_tyre"),
      tech("no flapping underneath", "flapping_underneath", false),
    ],
    [fail("liner_rub_check")],
    cause("arch_liner_loose"),
  ),
  bench(
    "body-sill-rust",
    "body",
    car("petrol", "fwd", 16, 187_000),
    [
      tech("rust holes along the sills", "rust_sills_visible"),
      tech("jacking points aren't damaged", "jacking_point_damage", false),
    ],
    [fail("sill_corrosion_inspect")],
    cause("sill_corrosion"),
  ),
  bench(
    "body-outer-handle",
    "body",
    car("petrol", "fwd", 9, 102_000),
    [
      owner("driver's door doesn't open from the outside handle", "door_wont_open_outside"),
      tech("no problem opening it from the inside", "door_wont_open_inside", false),
    ],
    [pass("lock_actuator_test"), fail("door_handle_linkage_inspect")],
    cause("outer_door_handle_failed"),
  ),
];
