/**
 * Where the database is. The only place that reads database settings from the environment; free of
 * 'server-only' so that the migrate and seed scripts can use it too.
 */
export function databaseUrl(): string {
  if (process.env.DATABASE_URL) return process.env.DATABASE_URL;
  const port = process.env.BRANCHLINE_PG_PORT ?? "55432";
  const name = process.env.BRANCHLINE_DB_NAME ?? "branchline";
  return `postgres://postgres@127.0.0.1:${port}/${name}`;
}
