// Run by scripts/test.sh once per run, before vitest: the migrated, seeded template database.
import { buildTemplate } from "./template";

await buildTemplate();
console.log("test template database ready");
