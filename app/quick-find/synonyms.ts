// Trade words that mean the same thing at the bench, written from general workshop experience.
// Each group is one concept; a member may be a single word or a phrase (an owner's way of saying
// it: "when I brake", "put my foot down"). Entries and queries are both rewritten through this
// table, so "judder when braking" meets "Vibration … under braking" without either side having to
// list the other's words. Keep groups tight: a loose group drags unrelated faults into the list.

export type SynonymGroup = { concept: string; members: string[] };

export const SYNONYM_GROUPS: SynonymGroup[] = [
  // Noises and feelings
  { concept: "vibration", members: ["vibration", "vibrate", "vibrates", "vibrating", "judder", "juddering", "shudder", "shuddering", "shake", "shakes", "shaking", "shaky", "wobble", "wobbling", "shimmy"] },
  { concept: "pulsing", members: ["pulsing", "pulse", "pulsate", "pulsating", "throb", "throbbing"] },
  { concept: "knock", members: ["knock", "knocking", "clunk", "clunking", "clonk", "thud", "thump", "thumping", "bang", "banging", "clatter"] },
  { concept: "rattle", members: ["rattle", "rattling", "rattly"] },
  { concept: "squeal", members: ["squeal", "squealing", "squeak", "squeaking", "squeaky", "screech", "screeching", "squeel"] },
  { concept: "grind", members: ["grind", "grinding", "scrape", "scraping", "metal on metal"] },
  { concept: "whine", members: ["whine", "whining", "hum", "humming", "drone", "droning", "howl", "howling", "whirr", "whirring", "moan", "moaning"] },
  { concept: "whistle", members: ["whistle", "whistling", "whoosh", "whooshing", "hiss", "hissing", "siren"] },
  { concept: "creak", members: ["creak", "creaking", "creaky", "groan", "groaning"] },
  { concept: "tick", members: ["tick", "ticking", "tap", "tapping"] },
  { concept: "click", members: ["click", "clicking", "clicks"] },
  { concept: "buzz", members: ["buzz", "buzzing", "tinny"] },
  { concept: "smell", members: ["smell", "smells", "smelly", "stink", "odour", "odor", "whiff"] },
  { concept: "leak", members: ["leak", "leaking", "drip", "dripping", "drips", "puddle", "weep", "weeping", "patch", "patches", "stain", "on the floor", "on the ground", "on the drive"] },
  // Handling
  { concept: "pull", members: ["pull", "pulls", "pulling to", "drift", "drifts", "drifting", "veer", "veers", "veering", "wander", "wanders", "wandering", "tramlining"] },
  { concept: "misfire", members: ["misfire", "misfiring", "stutter", "stuttering", "hesitate", "hesitates", "hesitation", "hesitating", "splutter", "spluttering", "flat spot", "lumpy", "jerk", "jerks", "jerking", "jerky", "kangaroo"] },
  { concept: "no_power", members: ["no power", "loss of power", "lack of power", "lost power", "limp mode", "limp home", "sluggish", "gutless", "underpowered", "reduced power", "no go", "down on power", "losing power", "lacks power", "lacking power"] },
  { concept: "stall", members: ["stall", "stalls", "stalling", "cuts out", "cutting out", "dies"] },
  { concept: "overheat", members: ["overheat", "overheats", "overheating", "running hot", "runs hot", "boils over", "boiling", "in the red", "into the red"] },
  // Complaints that are phrases
  { concept: "consumption", members: ["drinks fuel", "drinking fuel", "poor economy", "bad economy", "poor fuel economy", "fuel economy", "high consumption", "fuel consumption", "high fuel consumption", "mpg", "thirsty", "guzzles fuel", "uses more fuel", "using more fuel", "economy", "more fuel", "more petrol", "more diesel", "using more petrol", "uses more petrol", "using more diesel", "uses more diesel"] },
  { concept: "no_start", members: ["wont start", "won't start", "will not start", "doesnt start", "doesn't start", "no start", "non starter", "no crank", "wont crank", "won't crank", "doesn't crank", "not cranking", "nothing happens when i turn the key"] },
  { concept: "windows_dead", members: ["windows dead", "window dead", "windows wont go down", "windows won't go down", "window won't go down", "windows won't go up", "windows don't work", "window doesn't work", "windows do not move", "windows not working", "windows stopped working", "windows stuck"] },
  { concept: "flat_battery", members: ["flat battery", "battery flat", "dead battery", "battery dead", "battery keeps dying", "needs a jump", "jump start"] },
  { concept: "engine_light", members: ["engine light", "check engine", "check-engine light", "engine management light", "engine warning light", "malfunction indicator", "mil"] },
  // Conditions (part of a symptom's meaning) and the owner's ways of saying them
  { concept: "brake", members: ["brake", "brakes", "braking", "when i brake", "when i stop", "slowing down", "coming to a stop", "on the brakes", "stopping"] },
  { concept: "bump", members: ["bump", "bumps", "bumpy", "pothole", "potholes", "speed bump", "speed bumps", "rough road", "rough roads", "uneven road"] },
  { concept: "cornering", members: ["cornering", "corner", "corners", "turning", "turn", "turns", "bend", "bends", "roundabout", "going round corners"] },
  { concept: "at_speed", members: ["at speed", "high speed", "motorway speed", "on the motorway", "motorway", "highway", "dual carriageway", "cruising", "from speed"] },
  { concept: "idle", members: ["idle", "idling", "at idle", "tickover", "ticking over", "sitting still"] },
  { concept: "cold_start", members: ["cold start", "from cold", "when cold", "cold morning", "cold mornings", "first thing in the morning", "starting from cold", "cold engine"] },
  { concept: "accelerating", members: ["accelerating", "accelerate", "acceleration", "foot down", "put my foot down", "under load", "under power", "on the throttle"] },
  { concept: "bounce", members: ["bounce", "bounces", "bouncy", "bouncing", "floaty", "float", "floats", "wallow", "wallowing"] },
  { concept: "crank", members: ["crank", "cranks", "cranking", "turn over", "turns over", "turning over"] },
  { concept: "warm", members: ["when warm", "when hot", "warmed up", "once warm", "hot engine", "warm engine", "fully warm", "up to temperature"] },
  { concept: "low_speed", members: ["low speed", "slow speed", "walking pace", "crawling", "car park", "car parks"] },
  { concept: "uphill", members: ["uphill", "up hills", "up hill", "going up hills", "climbing", "climbing hills", "on hills", "hill", "hills"] },
  { concept: "hunting", members: ["hunts", "hunting", "hunt", "surges", "surging", "up and down", "goes up and down", "going up and down"] },
  { concept: "parked", members: ["parked", "standing", "stood", "sits", "sat", "left parked", "laid up"] },
  { concept: "wet", members: ["wet", "damp", "rain", "rainy", "raining", "wet weather"] },
  { concept: "with_road_speed", members: ["with road speed", "with speed", "the faster i go", "faster i go", "louder the faster", "gets louder with speed", "rises with speed"] },
  { concept: "traffic", members: ["traffic", "queue", "queues", "queueing", "stop start"] },
  { concept: "pulling_away", members: ["pulling away", "pull away", "pulls away", "setting off", "moving off", "take off", "take-off", "set off", "sets off", "pull off", "pulls off", "drive off"] },
  // Parts and gauges by their everyday names
  { concept: "lamp", members: ["lamp", "lamps", "light", "lights", "tell tale"] },
  { concept: "headlamp", members: ["headlamp", "headlamps", "headlight", "headlights"] },
  { concept: "handbrake", members: ["handbrake", "hand brake", "parking brake", "park brake", "e brake", "emergency brake"] },
  { concept: "fob", members: ["fob", "key fob", "remote", "remote key", "plip"] },
  { concept: "revs", members: ["revs", "rev", "rpm", "revving", "engine speed"] },
  { concept: "temperature", members: ["temperature", "temp"] },
  { concept: "gauge", members: ["gauge", "needle"] },
  { concept: "power_steering", members: ["power steering", "power assisted steering", "steering assist"] },
  { concept: "switch", members: ["switch", "switches", "button", "buttons"] },
  { concept: "underneath", members: ["underneath", "underside", "beneath", "under the car", "from under"] },
  { concept: "dashboard", members: ["dash", "dashboard", "instrument panel", "clocks"] },
  { concept: "bulge", members: ["bulge", "bulges", "bulging", "lump", "lumps"] },
  // Spellings and regional words for the same part
  { concept: "tyre", members: ["tyre", "tire", "tyres", "tires"] },
  { concept: "disc", members: ["disc", "disk", "rotor", "rotors"] },
  { concept: "damper", members: ["damper", "dampers", "shock", "shocks", "shock absorber"] },
  { concept: "silencer", members: ["silencer", "muffler", "back box"] },
  { concept: "windscreen", members: ["windscreen", "windshield", "screen"] },
  { concept: "bonnet", members: ["bonnet", "hood"] },
  { concept: "gearbox", members: ["gearbox", "transmission", "box"] },
  { concept: "coolant", members: ["coolant", "antifreeze", "anti freeze"] },
  { concept: "petrol", members: ["petrol", "gasoline"] },
  { concept: "kerb", members: ["kerb", "curb"] },
];
