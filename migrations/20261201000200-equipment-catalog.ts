import { DataTypes } from "sequelize";
import type { MigrationContext } from "@/lib/db/migrator";

export async function up({ context: q }: { context: MigrationContext }) {
  await q.createTable("equipment", {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    organization_id: { type: DataTypes.UUID, allowNull: false, references: { model: "organizations", key: "id" }, onDelete: "CASCADE" },
    kind: { type: DataTypes.STRING(20), allowNull: false },
    maker: { type: DataTypes.STRING(80), allowNull: false },
    model: { type: DataTypes.STRING(80), allowNull: false },
    listing: { type: DataTypes.STRING(120), allowNull: false, defaultValue: "" },
    specs: { type: DataTypes.JSONB, allowNull: false },
    datasheet_key: { type: DataTypes.STRING(300) },
    datasheet_file_name: { type: DataTypes.STRING(200) },
    datasheet_size_bytes: { type: DataTypes.INTEGER },
    datasheet_uploaded_at: { type: DataTypes.DATE },
    is_archived: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await q.sequelize.query(`alter table equipment add constraint equipment_kind_check check (kind in ('module','inverter','device'))`);
  // "Larkspur LK-405" and "larkspur lk-405" are the same product: compare without case.
  await q.sequelize.query(
    `create unique index equipment_organization_kind_maker_model on equipment (organization_id, kind, lower(maker), lower(model))`,
  );

  await q.addColumn("utilities", "required_grid_profile", { type: DataTypes.TEXT, allowNull: false, defaultValue: "" });
}

export async function down({ context: q }: { context: MigrationContext }) {
  await q.removeColumn("utilities", "required_grid_profile");
  await q.dropTable("equipment");
}
