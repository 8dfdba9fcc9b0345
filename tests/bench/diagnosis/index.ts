// Every benchmark case, grouped by file only to keep the files small.
import type { BenchCase } from "./case-types";
import { bodySystemCases } from "./cases-body-systems";
import { chassisCases } from "./cases-chassis";
import { missingCauseCases } from "./cases-missing";
import { powertrainCases } from "./cases-powertrain";

export const benchCases: BenchCase[] = [
  ...chassisCases,
  ...powertrainCases,
  ...bodySystemCases,
  ...missingCauseCases,
];
export type { BenchCase } from "./case-types";
