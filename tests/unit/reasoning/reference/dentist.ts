import type { Model } from "~/reasoning";

// Russell & Norvig, Artificial Intelligence: A Modern Approach, ch. 13: the dentist's joint table
// cavity/toothache/catch .108 .012 .072 .008 / .016 .064 .144 .576, as a two-cause model.
//   P(cavity) = .108+.012+.072+.008 = .2;      P(¬cavity) = .8
//   P(toothache | cavity) = (.108+.012)/.2 = .6;  P(toothache | ¬cavity) = (.016+.064)/.8 = .1
//   P(catch | cavity)     = (.108+.072)/.2 = .9;  P(catch | ¬cavity)     = (.016+.144)/.8 = .2
export const dentist: Model = {
  causes: [
    { id: "cavity", prior: 0.2 },
    { id: "no-cavity", prior: 0.8 },
  ],
  symptoms: [
    { id: "toothache", leak: 0.5 },
    { id: "catch", leak: 0.5 },
  ],
  links: [
    { symptomId: "toothache", causeId: "cavity", p: 0.6 },
    { symptomId: "toothache", causeId: "no-cavity", p: 0.1 },
    { symptomId: "catch", causeId: "cavity", p: 0.9 },
    { symptomId: "catch", causeId: "no-cavity", p: 0.2 },
  ],
  checks: [],
};
