import { DataTypes } from "sequelize";
import type { MigrationContext } from "@/lib/db/migrator";

export async function up({ context: q }: { context: MigrationContext }) {
  // One record per project: the installer saves it as often as needed and resumes it later.
  await q.createTable("commissioning_records", {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    organization_id: { type: DataTypes.UUID, allowNull: false, references: { model: "organizations", key: "id" }, onDelete: "CASCADE" },
    project_id: { type: DataTypes.UUID, allowNull: false, unique: true, references: { model: "projects", key: "id" }, onDelete: "CASCADE" },
    readings: { type: DataTypes.JSONB, allowNull: false },
    status: { type: DataTypes.STRING(10), allowNull: false, defaultValue: "open" },
    completed_at: { type: DataTypes.DATE },
    completed_by_id: { type: DataTypes.UUID, references: { model: "users", key: "id" }, onDelete: "SET NULL" },
    updated_by_id: { type: DataTypes.UUID, references: { model: "users", key: "id" }, onDelete: "SET NULL" },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await q.sequelize.query(
    `alter table commissioning_records add constraint commissioning_records_status_check check (status in ('open','complete'))`,
  );

  // Uploaded files: the object key is made by the server; the name is the uploader's, kept for display only.
  await q.createTable("project_files", {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    organization_id: { type: DataTypes.UUID, allowNull: false, references: { model: "organizations", key: "id" }, onDelete: "CASCADE" },
    project_id: { type: DataTypes.UUID, allowNull: false, references: { model: "projects", key: "id" }, onDelete: "CASCADE" },
    kind: { type: DataTypes.STRING(20), allowNull: false },
    object_key: { type: DataTypes.STRING(300), allowNull: false, unique: true },
    file_name: { type: DataTypes.STRING(200), allowNull: false },
    content_type: { type: DataTypes.STRING(60), allowNull: false },
    size_bytes: { type: DataTypes.INTEGER, allowNull: false },
    sha256: { type: DataTypes.STRING(64), allowNull: false },
    uploaded_by_id: { type: DataTypes.UUID, references: { model: "users", key: "id" }, onDelete: "SET NULL" },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  await q.sequelize.query(
    `alter table project_files add constraint project_files_kind_check check (kind in ('signed-completion','site-photo'))`,
  );
  await q.addIndex("project_files", ["project_id", "created_at"], { name: "project_files_project_time" });
}

export async function down({ context: q }: { context: MigrationContext }) {
  await q.dropTable("project_files");
  await q.dropTable("commissioning_records");
}
