import { DataTypes } from "sequelize";
import type { MigrationContext } from "@/lib/db/migrator";

// The residential ESS siting limits an AHJ adopted (its code edition and amendments). Null: the published
// model-code figures the review uses by default.
const COLUMNS = ["ess_per_unit_kwh", "ess_garage_kwh", "ess_outdoor_kwh", "ess_utility_space_kwh"] as const;

export async function up({ context: q }: { context: MigrationContext }) {
  await q.addColumn("jurisdictions", "ess_code", { type: DataTypes.STRING(60), allowNull: true });
  for (const column of COLUMNS) await q.addColumn("jurisdictions", column, { type: DataTypes.DOUBLE, allowNull: true });
}

export async function down({ context: q }: { context: MigrationContext }) {
  for (const column of [...COLUMNS].reverse()) await q.removeColumn("jurisdictions", column);
  await q.removeColumn("jurisdictions", "ess_code");
}
