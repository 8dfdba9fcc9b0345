// Quick find test entries built from the real starter knowledge base and the demo fleet and case
// book, so the tests exercise the names and synonyms technicians will actually search.
import { caseEntry, entriesFromKnowledgeBase, type Entry, vehicleEntry } from "~/quick-find";
import { DEMO_CASES } from "../../../seeds/demo/cases";
import { DEMO_OWNERS, DEMO_VEHICLES } from "../../../seeds/demo/fleet";
import { starterKnowledgeBase } from "../../../seeds/kb";

export const kbEntries: Entry[] = entriesFromKnowledgeBase(starterKnowledgeBase);

export const fleetEntries: Entry[] = [
  ...DEMO_VEHICLES.map((v) =>
    vehicleEntry({
      id: v.key,
      registration: v.registration,
      vin: v.vin,
      make: v.make,
      model: v.model,
      year: v.year,
      ownerName: DEMO_OWNERS.find((o) => o.key === v.owner)?.name,
    }),
  ),
  ...DEMO_CASES.map((c) => {
    const v = DEMO_VEHICLES.find((x) => x.key === c.vehicle);
    return caseEntry({
      id: c.key,
      number: c.number,
      registration: v?.registration,
      vehicle: v ? `${v.make} ${v.model}` : undefined,
      complaint: c.complaint,
    });
  }),
];

export const allEntries: Entry[] = [...kbEntries, ...fleetEntries];
export const vehicleByReg = (reg: string) => DEMO_VEHICLES.find((v) => v.registration === reg);
export const caseByNumber = (n: number) => DEMO_CASES.find((c) => c.number === n);
