/** One concept and the words and phrases that mean it at the bench (app/quick-find/synonyms.ts). */
export type SynonymGroup = { concept: string; members: string[] };
