import { DataTypes } from "sequelize";
import type { MigrationContext } from "@/lib/db/migrator";

export async function up({ context: q }: { context: MigrationContext }) {
  // A refund the processor later marks failed stops counting as money returned.
  await q.addColumn("refunds", "status", { type: DataTypes.STRING(20), allowNull: false, defaultValue: "succeeded" });
  await q.sequelize.query(`alter table refunds add constraint refunds_status_check check (status in ('pending','succeeded','failed'))`);
}

export async function down({ context: q }: { context: MigrationContext }) {
  await q.removeColumn("refunds", "status");
}
