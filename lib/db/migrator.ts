import path from "node:path";
import { fileURLToPath } from "node:url";
import type { QueryInterface, Sequelize } from "sequelize";
import { SequelizeStorage, Umzug } from "umzug";

export type MigrationContext = QueryInterface;

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "../..");

/** The umzug migrator over migrations/*.ts, recording applied ones in PostgreSQL. */
export function createMigrator(sequelize: Sequelize) {
  return new Umzug({
    migrations: {
      glob: ["migrations/*.ts", { cwd: root }],
      // Importing here, not inside umzug, lets tsx and vitest load the TypeScript files.
      resolve: ({ name, path: file, context }) => ({
        name,
        up: async () => (await import(/* @vite-ignore */ file!)).up({ context }),
        down: async () => (await import(/* @vite-ignore */ file!)).down({ context }),
      }),
    },
    context: sequelize.getQueryInterface(),
    storage: new SequelizeStorage({ sequelize, tableName: "schema_migrations" }),
    logger: undefined,
  });
}
