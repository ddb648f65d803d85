import type { Sequelize } from "sequelize";

/** Closes the shared pool and forgets it, so a later test file in the same worker opens a fresh one. */
export async function closeDb() {
  const holder = globalThis as unknown as { ohmsteadSequelize?: Sequelize };
  await holder.ohmsteadSequelize?.close();
  delete holder.ohmsteadSequelize;
}
