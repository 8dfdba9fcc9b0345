import { drizzle, type NodePgDatabase } from "drizzle-orm/node-postgres";
import pg from "pg";
import * as schema from "./schema";

export type Db = NodePgDatabase<typeof schema>;
/** The handle a transaction callback gets: everything a change needs, inside one transaction. */
export type Tx = Parameters<Parameters<Db["transaction"]>[0]>[0];

/** One pool per process; a backend killed under us logs and reconnects instead of crashing. */
export function createDb(
  url: string,
  options: { max?: number; onQuery?: (sql: string) => void } = {},
): { db: Db; pool: pg.Pool } {
  const pool = new pg.Pool({
    connectionString: url,
    max: options.max ?? 10,
    connectionTimeoutMillis: 5_000,
    idleTimeoutMillis: 30_000,
  });
  // node-postgres: an idle client's error is emitted on the pool; without a listener it kills the process.
  pool.on("error", (error) => console.warn("postgres pool: idle client error:", error.message));
  const logger = options.onQuery ? { logQuery: (sql: string) => options.onQuery!(sql) } : undefined;
  return { db: drizzle(pool, { schema, logger }), pool };
}
