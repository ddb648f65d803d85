import { DataTypes } from "sequelize";
import type { MigrationContext } from "@/lib/db/migrator";

export async function up({ context: q }: { context: MigrationContext }) {
  // Stored objects whose record is gone, written in the same transaction as the removal; a row
  // stays until the object is gone from storage, so a storage outage never leaves one behind.
  await q.createTable("storage_removals", {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    object_key: { type: DataTypes.STRING(300), allowNull: false, unique: true },
    attempts: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    next_attempt_at: { type: DataTypes.DATE, allowNull: false },
    last_error: { type: DataTypes.TEXT },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await q.addIndex("storage_removals", ["next_attempt_at"], { name: "storage_removals_next_attempt" });
}

export async function down({ context: q }: { context: MigrationContext }) {
  await q.dropTable("storage_removals");
}
