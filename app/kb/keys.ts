import { randomUUID } from "node:crypto";

/**
 * The key of an item made in the app (a cause, check or symptom): readable from its name, unique
 * by a random tail, so an export names it the same way ever after (docs/knowledge-format.md).
 */
export const keyFor = (name: string) =>
  `${
    name
      .toLowerCase()
      .normalize("NFKD")
      .replace(/[^a-z0-9]+/g, "_")
      .replace(/^_+|_+$/g, "")
      .slice(0, 40) || "item"
  }_${randomUUID().slice(0, 8)}`;
