import { db } from "@/lib/server/db";

/** Runs `work` and returns every SQL statement the shared pool sent meanwhile, through Sequelize's `logging` hook. */
export async function sqlDuring<T>(work: () => Promise<T>): Promise<{ result: T; sql: string[] }> {
  // The typings leave `options` out; Sequelize reads options.logging on every query.
  const sequelize = db() as unknown as { options: { logging?: false | ((sql: string) => void) } };
  const before = sequelize.options.logging;
  const sql: string[] = [];
  sequelize.options.logging = (statement: string) => void sql.push(statement);
  try {
    return { result: await work(), sql };
  } finally {
    sequelize.options.logging = before;
  }
}

/** Reads of one table (a SELECT whose FROM names it), leaving out row locks taken to order writers (FOR UPDATE). */
export const readsOf = (sql: string[], table: string) =>
  sql.filter((s) => /\bSELECT\b/.test(s) && s.includes(`FROM "${table}"`) && !/FOR UPDATE/.test(s));
