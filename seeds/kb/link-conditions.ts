// Under which conditions a cause shows its symptom, for the links where that tells causes apart
// (the ranking weighs an observation's conditions against these; docs/reasoning.md). Kept in one
// table so a senior sees them together; each entry names an existing symptom link. Starter
// estimates from common workshop experience, no published source.
import type { Condition } from "../../app/reasoning/conditions";

export const LINK_CONDITIONS: Record<string, Condition[]> = {
  // A tick from a lifter is loudest cold and at idle; a tick from low oil comes once it is warm.
  "tick_top_end|hydraulic_lifter_noisy": ["cold", "at_idle"],
  "tick_top_end|oil_level_low": ["warm", "at_idle"],
  "tick_top_end|oil_pump_pickup_blocked": ["warm"],
  // Front clunks: a drop link over small bumps at low speed, a top mount over bumps while turning,
  // a ball joint or arm bush over bumps and under braking.
  "clunk_front_bumps|drop_link_worn": ["over_bumps", "low_speed"],
  "clunk_front_bumps|top_mount_worn": ["over_bumps", "turning"],
  "clunk_front_bumps|ball_joint_worn": ["over_bumps", "braking"],
  "clunk_front_bumps|arm_bush_worn": ["over_bumps", "braking"],
  "creak_turning|top_mount_worn": ["turning", "low_speed"],
  "creak_turning|arb_bush_worn": ["turning", "over_bumps"],
  // A wheel bearing hums at speed and changes when turning; a driveline bearing under load.
  "whine_road_speed|wheel_bearing_worn": ["high_speed", "turning"],
  "whine_road_speed|final_drive_bearing": ["accelerating", "high_speed"],
  "whine_road_speed|driveshaft_support_bearing": ["accelerating"],
  // Shakes: an unbalanced wheel at motorway speed, a bent rim at any speed, a warped disc under
  // braking from speed, a worn driveshaft or prop-shaft bearing under load.
  "vibration_speed|wheel_out_of_balance": ["high_speed"],
  "vibration_speed|wheel_rim_bent": ["low_speed", "mid_speed", "high_speed"],
  "vibration_speed|driveshaft_support_bearing": ["accelerating", "high_speed"],
  "vibration_braking|brake_disc_runout_dtv": ["braking", "high_speed"],
  "vibration_braking|wheel_out_of_balance": ["high_speed"],
  // Idle trouble from a coked throttle body shows warm, at idle.
  "stalls_idle|throttle_body_dirty": ["at_idle", "warm"],
  "idle_hunting|throttle_body_dirty": ["at_idle", "warm"],
};
