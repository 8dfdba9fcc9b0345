// The demo's case book: a few vehicles on the bench today and some closed visits, whose
// confirmed causes give the outcome counts something to learn from. All invented.

export type DemoCase = {
  key: string;
  workshop: "bramblegate" | "saltmarsh";
  number: number;
  vehicle: string; // DemoVehicle key
  complaint: string;
  state: "open" | "awaiting_signoff" | "concluded" | "closed";
  assignedTo?: string; // login
  openedBy: string; // login
  daysAgo: number;
  observations: { symptom: string; present: boolean; source: "owner" | "technician" }[];
  findings: { check: string; result: "pass" | "fail"; reading?: string }[];
  conclusion?: { cause: string; notes: string; by: string; signedOffBy?: string };
};

export const DEMO_CASES: DemoCase[] = [
  {
    key: "b1",
    workshop: "bramblegate",
    number: 1041,
    vehicle: "orlan-brisk",
    state: "open",
    complaint: "The steering wheel shakes when I brake coming down off the motorway.",
    assignedTo: "priya-hale",
    openedBy: "dana-reyes",
    daysAgo: 0,
    observations: [{ symptom: "vibration_braking", present: true, source: "owner" }],
    findings: [],
  },
  {
    key: "b2",
    workshop: "bramblegate",
    number: 1042,
    vehicle: "veskar-fathom",
    state: "open",
    complaint: "There's a squeal every time I brake, and it's getting louder.",
    assignedTo: "ollie-mbeki",
    openedBy: "dana-reyes",
    daysAgo: 0,
    observations: [{ symptom: "squeal_braking", present: true, source: "owner" }],
    findings: [],
  },
  {
    key: "b3",
    workshop: "bramblegate",
    number: 1038,
    vehicle: "orlan-brisk-2",
    state: "awaiting_signoff",
    complaint: "Brakes feel a bit grabby and it pulls when I stop.",
    assignedTo: "ollie-mbeki",
    openedBy: "dana-reyes",
    daysAgo: 1,
    observations: [
      { symptom: "pull_braking", present: true, source: "owner" },
      { symptom: "hot_wheel_smell", present: true, source: "technician" },
    ],
    findings: [{ check: "wheel_drag_spin", result: "fail" }],
    conclusion: {
      cause: "brake_caliper_sticking",
      notes: "Front left caliper slide pins dry and binding; wheel hot after road test.",
      by: "ollie-mbeki",
    },
  },
  {
    key: "b4",
    workshop: "bramblegate",
    number: 1031,
    vehicle: "pellin-tern",
    state: "concluded",
    complaint: "Grinding noise from the front when I brake.",
    assignedTo: "priya-hale",
    openedBy: "dana-reyes",
    daysAgo: 3,
    observations: [
      { symptom: "grinding_braking", present: true, source: "owner" },
      { symptom: "squeal_braking", present: false, source: "technician" },
    ],
    findings: [{ check: "pad_thickness", result: "fail", reading: "0.8 mm" }],
    conclusion: {
      cause: "brake_pads_metal",
      notes: "Front inner pads worn to the backing plate; discs scored.",
      by: "priya-hale",
    },
  },
  {
    key: "b5",
    workshop: "bramblegate",
    number: 1012,
    vehicle: "orlan-brisk-2",
    state: "closed",
    complaint: "Judder through the wheel under braking.",
    assignedTo: "priya-hale",
    openedBy: "dana-reyes",
    daysAgo: 40,
    observations: [{ symptom: "vibration_braking", present: true, source: "technician" }],
    findings: [{ check: "disc_runout_dial_gauge", result: "fail", reading: "0.11 mm" }],
    conclusion: {
      cause: "brake_disc_runout_dtv",
      notes: "Front discs out of true; replaced discs and pads.",
      by: "priya-hale",
    },
  },
  {
    key: "b6",
    workshop: "bramblegate",
    number: 1019,
    vehicle: "veskar-fathom",
    state: "closed",
    complaint: "Squeaks at low speed when braking.",
    assignedTo: "tomas-varga",
    openedBy: "dana-reyes",
    daysAgo: 25,
    observations: [{ symptom: "squeal_braking", present: true, source: "technician" }],
    findings: [{ check: "pad_thickness", result: "fail", reading: "2.1 mm" }],
    conclusion: {
      cause: "brake_pads_worn",
      notes: "Pads at wear indicator; replaced front pads.",
      by: "tomas-varga",
    },
  },
  {
    key: "s1",
    workshop: "saltmarsh",
    number: 310,
    vehicle: "veskar-fathom-ie",
    state: "open",
    complaint: "Brake pedal goes further down than it used to.",
    assignedTo: "rowan-quill",
    openedBy: "kit-arbuthnot",
    daysAgo: 0,
    observations: [{ symptom: "soft_pedal", present: true, source: "owner" }],
    findings: [],
  },
];
