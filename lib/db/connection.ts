import pg from "pg";
import { Sequelize } from "sequelize";
import { initModels } from "@/models";

/** A Sequelize instance with every model bound; used by the app, the scripts and the tests. */
export function createSequelize(databaseUrl: string, { logging = false }: { logging?: boolean } = {}) {
  const sequelize = new Sequelize(databaseUrl, {
    dialect: "postgres",
    // Passing the driver keeps bundlers from having to resolve Sequelize's dynamic require.
    dialectModule: pg,
    logging: logging ? console.log : false,
    pool: { max: 10, min: 0, idle: 10_000 },
  });
  initModels(sequelize);
  return sequelize;
}
