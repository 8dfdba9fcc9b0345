// The one check the command-line scripts share: where the database is.
export function databaseUrl(): string {
  const url = process.env.DATABASE_URL;
  if (!url) {
    console.error("DATABASE_URL is not set (scripts/pg.sh url prints the local one)");
    process.exit(2);
  }
  return url;
}
