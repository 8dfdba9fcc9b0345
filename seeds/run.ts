// `npm run db:seed`: the demo workshops, their members, vehicles, cases and knowledge base.
import { createDb } from "../app/db/client.server";
import { seedDemo } from "./demo";

const url = process.env.DATABASE_URL;
if (!url) {
  console.error("DATABASE_URL is not set (scripts/pg.sh url prints the local one)");
  process.exit(2);
}
const { db, pool } = createDb(url, { max: 1 });
try {
  await seedDemo(db);
  console.log("demo workshop seeded");
} finally {
  await pool.end();
}
