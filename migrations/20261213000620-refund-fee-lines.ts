import { DataTypes } from "sequelize";
import type { MigrationContext } from "@/lib/db/migrator";

export async function up({ context: q }: { context: MigrationContext }) {
  // The fee lines a refund gives back (lib/fees/refunds.ts); empty for a refund of money not tied to a line.
  await q.addColumn("refunds", "fee_keys", { type: DataTypes.JSONB, allowNull: false, defaultValue: [] });
}

export async function down({ context: q }: { context: MigrationContext }) {
  await q.removeColumn("refunds", "fee_keys");
}
