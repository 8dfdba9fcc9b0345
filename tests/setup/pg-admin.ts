import pg from "pg";

// The test cluster is started by scripts/test.sh; its admin URL arrives in TEST_PG_URL.
export const TEMPLATE_DB = "rl_template";

export function adminUrl(database = "postgres") {
  const base = process.env.TEST_PG_URL;
  if (!base)
    throw new Error("TEST_PG_URL is not set: run the tests with `npm test`, which starts the test cluster");
  const url = new URL(base);
  url.pathname = `/${database}`;
  return url.toString();
}

export async function withAdmin<T>(fn: (client: pg.Client) => Promise<T>): Promise<T> {
  const client = new pg.Client({ connectionString: adminUrl() });
  await client.connect();
  try {
    return await fn(client);
  } finally {
    await client.end();
  }
}

/** A fresh database copied from the migrated, seeded template: fast, and isolated per test file. */
export async function cloneTemplate(name: string) {
  await withAdmin(async (c) => {
    await c.query(`drop database if exists "${name}" with (force)`);
    await c.query(`create database "${name}" template "${TEMPLATE_DB}"`);
  });
  return adminUrl(name);
}

export async function dropDatabase(name: string) {
  await withAdmin((c) => c.query(`drop database if exists "${name}" with (force)`));
}
