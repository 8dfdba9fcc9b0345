// The invented people of the demo: two workshops, members of every role, and one newcomer
// without an invitation. None of them is a real person; the logins and ids are made up and
// exist only in our fake sign-in provider.

import type { Role, Skill } from "../../app/domain/people";

export type DemoPerson = {
  githubId: number; // the fake provider's numeric user id
  login: string;
  name: string;
  email: string;
  workshop: "bramblegate" | "saltmarsh" | null; // null: not a member anywhere yet
  role: Role | null;
  skill?: Skill;
};

export const DEMO_WORKSHOPS = {
  bramblegate: {
    slug: "bramblegate",
    name: "Bramblegate Motor Works",
    country: "GB",
    labourRatePerHour: 84,
  },
  saltmarsh: {
    slug: "saltmarsh",
    name: "Saltmarsh Vehicle Clinic",
    country: "IE",
    labourRatePerHour: 78,
  },
} as const;

export const DEMO_PEOPLE: DemoPerson[] = [
  {
    githubId: 910001,
    login: "ines-okafor",
    name: "Ines Okafor",
    email: "ines@bramblegate.example",
    workshop: "bramblegate",
    role: "admin",
  },
  {
    githubId: 910002,
    login: "tomas-varga",
    name: "Tomas Varga",
    email: "tomas@bramblegate.example",
    workshop: "bramblegate",
    role: "senior",
    skill: "senior",
  },
  {
    githubId: 910003,
    login: "priya-hale",
    name: "Priya Hale",
    email: "priya@bramblegate.example",
    workshop: "bramblegate",
    role: "technician",
    skill: "technician",
  },
  {
    githubId: 910004,
    login: "ollie-mbeki",
    name: "Ollie Mbeki",
    email: "ollie@bramblegate.example",
    workshop: "bramblegate",
    role: "apprentice",
    skill: "apprentice",
  },
  {
    githubId: 910005,
    login: "dana-reyes",
    name: "Dana Reyes",
    email: "dana@bramblegate.example",
    workshop: "bramblegate",
    role: "advisor",
  },
  {
    githubId: 920001,
    login: "kit-arbuthnot",
    name: "Kit Arbuthnot",
    email: "kit@saltmarsh.example",
    workshop: "saltmarsh",
    role: "admin",
  },
  {
    githubId: 920002,
    login: "rowan-quill",
    name: "Rowan Quill",
    email: "rowan@saltmarsh.example",
    workshop: "saltmarsh",
    role: "technician",
    skill: "technician",
  },
  {
    githubId: 930001,
    login: "sam-newcomer",
    name: "Sam Newcomer",
    email: "sam@newcomer.example",
    workshop: null,
    role: null,
  },
];
