// Quick find, the pure part: entries → index → grouped results. No React, no database.
export { buildIndex, FIELD_WEIGHT, FUSE_KEYS, type FieldPolarity, type QuickFindIndex } from "./build";
export { cachedKeys, clearQuickFindCache, getIndex, quickFindKey } from "./cache";
export {
  caseEntry,
  causeEntry,
  checkEntry,
  entriesFromKnowledgeBase,
  symptomEntry,
  SYSTEM_LABEL,
  vehicleEntry,
  type CaseInput,
  type CauseInput,
  type CheckInput,
  type KnowledgeBaseInputs,
  type SymptomInput,
  type VehicleInput,
} from "./entries";
export { NEGATIONS, normaliseText, porterStem } from "./normalise";
export { parseQuery, type ParsedQuery } from "./query";
export { DEFAULT_LIMIT, RELATIVE_FLOOR, search, WEAK_QUALITY } from "./search";
export { presentFor } from "./score";
export { conditionsOf } from "./conditions";
export { SYNONYM_GROUPS, type SynonymGroup } from "./synonyms";
export {
  ENTRY_KINDS,
  GROUP_HEADING,
  type Entry,
  type EntryKind,
  type GroupKind,
  type ResultGroup,
  type ScoredEntry,
  type SearchOptions,
} from "./types";
