import pg from "pg";

/** One query on its own connection: for tests that look into the database an app process writes to. */
export async function query<T = Record<string, unknown>>(connectionString: string, text: string, params: unknown[] = []): Promise<T[]> {
  const client = new pg.Client({ connectionString });
  await client.connect();
  try {
    return (await client.query(text, params)).rows as T[];
  } finally {
    await client.end();
  }
}
