import { DataTypes } from "sequelize";
import type { MigrationContext } from "@/lib/db/migrator";

export async function up({ context: q }: { context: MigrationContext }) {
  // Field reports and receipts print local times; the admin sets the zone under Settings → Organization.
  await q.addColumn("organizations", "time_zone", { type: DataTypes.STRING(60), allowNull: false, defaultValue: "America/New_York" });
}

export async function down({ context: q }: { context: MigrationContext }) {
  await q.removeColumn("organizations", "time_zone");
}
