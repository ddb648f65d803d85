import { DataTypes } from "sequelize";
import type { MigrationContext } from "@/lib/db/migrator";

// A utility names the grid profiles it accepts (often more than one); the crew chooses from them on site.
export async function up({ context: q }: { context: MigrationContext }) {
  await q.addColumn("utilities", "accepted_grid_profiles", { type: DataTypes.ARRAY(DataTypes.TEXT), allowNull: false, defaultValue: [] });
  await q.sequelize.query(
    `UPDATE utilities SET accepted_grid_profiles = ARRAY[required_grid_profile] WHERE btrim(required_grid_profile) <> ''`,
  );
  await q.removeColumn("utilities", "required_grid_profile");
}

export async function down({ context: q }: { context: MigrationContext }) {
  await q.addColumn("utilities", "required_grid_profile", { type: DataTypes.TEXT, allowNull: false, defaultValue: "" });
  // One profile fits the old column: the first accepted one.
  await q.sequelize.query(`UPDATE utilities SET required_grid_profile = COALESCE(accepted_grid_profiles[1], '')`);
  await q.removeColumn("utilities", "accepted_grid_profiles");
}
