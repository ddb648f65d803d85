import { DataTypes } from "sequelize";
import type { MigrationContext } from "@/lib/db/migrator";

export async function up({ context: q }: { context: MigrationContext }) {
  await q.createTable("packets", {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    organization_id: { type: DataTypes.UUID, allowNull: false, references: { model: "organizations", key: "id" }, onDelete: "CASCADE" },
    project_id: { type: DataTypes.UUID, allowNull: false, references: { model: "projects", key: "id" }, onDelete: "CASCADE" },
    kind: { type: DataTypes.STRING(20), allowNull: false },
    // The revision this generation will become; only a ready row counts as that revision.
    revision: { type: DataTypes.INTEGER, allowNull: false },
    status: { type: DataTypes.STRING(10), allowNull: false, defaultValue: "queued" },
    progress: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    step: { type: DataTypes.STRING(80), allowNull: false, defaultValue: "" },
    input: { type: DataTypes.JSONB, allowNull: false },
    changes: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
    override_reason: { type: DataTypes.TEXT },
    object_key: { type: DataTypes.STRING(300) },
    sha256: { type: DataTypes.STRING(64) },
    size_bytes: { type: DataTypes.INTEGER },
    page_count: { type: DataTypes.INTEGER },
    error: { type: DataTypes.TEXT },
    attempts: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    requested_by_id: { type: DataTypes.UUID, references: { model: "users", key: "id" }, onDelete: "SET NULL" },
    ready_at: { type: DataTypes.DATE },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await q.sequelize.query(`alter table packets add constraint packets_kind_check check (kind in ('permit','interconnection'))`);
  await q.sequelize.query(
    `alter table packets add constraint packets_status_check check (status in ('queued','running','ready','failed'))`,
  );
  await q.addIndex("packets", ["project_id", "kind", "revision"], { unique: true, name: "packets_project_kind_revision" });
}

export async function down({ context: q }: { context: MigrationContext }) {
  await q.dropTable("packets");
}
