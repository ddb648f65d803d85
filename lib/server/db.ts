import "server-only";
import type { Sequelize } from "sequelize";
import { createSequelize } from "@/lib/db/connection";
import { initModels } from "@/models";
import { env } from "./env";

const globalForDb = globalThis as unknown as { ohmsteadSequelize?: Sequelize };

/**
 * The app's one Sequelize instance, kept on globalThis so every bundle layer
 * and dev reload shares one pool. The bundler may hold several copies of the
 * model classes (one per layer), so each copy is bound on first use.
 */
export function db(): Sequelize {
  globalForDb.ohmsteadSequelize ??= createSequelize(env().DATABASE_URL);
  initModels(globalForDb.ohmsteadSequelize);
  return globalForDb.ohmsteadSequelize;
}
