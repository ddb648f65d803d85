import "server-only";
import type { Sequelize } from "sequelize";
import { createSequelize } from "@/lib/db/connection";
import { env } from "./env";

const globalForDb = globalThis as unknown as { ohmsteadSequelize?: Sequelize };

/** The app's one Sequelize instance (kept on globalThis so dev reloads reuse the pool). */
export function db(): Sequelize {
  globalForDb.ohmsteadSequelize ??= createSequelize(env().DATABASE_URL);
  return globalForDb.ohmsteadSequelize;
}
