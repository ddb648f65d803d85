import { DataTypes } from "sequelize";
import type { MigrationContext } from "@/lib/db/migrator";

export async function up({ context: q }: { context: MigrationContext }) {
  // The steps the worker took in its last attempt, each with when it started and the progress it stood at.
  await q.addColumn("packets", "steps", { type: DataTypes.JSONB, allowNull: false, defaultValue: [] });
}

export async function down({ context: q }: { context: MigrationContext }) {
  await q.removeColumn("packets", "steps");
}
