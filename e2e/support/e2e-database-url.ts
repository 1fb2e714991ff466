/** The browser tests' database (scripts/e2e.sh makes it and passes its URL in the environment). */
export function e2eDatabaseUrl(): string {
  const url = process.env.DATABASE_URL;
  if (!url)
    throw new Error("DATABASE_URL is not set: run the browser tests through scripts/e2e.sh");
  return url;
}
