// `npm run db:seed`: the demo workshops, their members, vehicles, cases and knowledge base.
import { createDb } from "../app/db/client.server";
import { databaseUrl } from "../scripts/database-url";
import { seedDemo } from "./demo";

const { db, pool } = createDb(databaseUrl(), { max: 1 });
try {
  await seedDemo(db);
  console.log("demo workshop seeded");
} finally {
  await pool.end();
}
