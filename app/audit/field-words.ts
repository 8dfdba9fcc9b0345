// The words for a knowledge-base item's fields, as its history and the audit log say what changed.

export const SYMPTOM_FIELD_WORDS: Record<string, string> = {
  name: "its name",
  synonyms: "the words people use for it",
  kind: "its kind",
  code: "its trouble code",
  conditions: "when it shows",
  leak: "how often it shows without a listed cause",
};

export const CHECK_FIELD_WORDS: Record<string, string> = {
  name: "its name",
  instructions: "its steps",
  tools: "its tools",
  minutes: "its minutes",
  consumablesCost: "its consumables cost",
  access: "the access it needs",
  skill: "who may do it",
  cautions: "its cautions",
  quantity: "the quantity measured",
  unit: "its unit",
  rule: "its rule",
  failMeans: "what a fail means",
  falseAlarm: "its false-alarm rate",
};

export const CAUSE_FIELD_WORDS: Record<string, string> = {
  description: "the technician's description",
  ownerDescription: "the words for the owner",
  ifLeft: "what happens if it is left",
  baseRate: "the base rate",
  repairMinutes: "the repair minutes",
  partsCost: "the parts cost",
  priority: "the priority",
  applicability: "which vehicles it applies to",
};
