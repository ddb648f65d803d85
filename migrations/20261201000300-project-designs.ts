import { DataTypes } from "sequelize";
import type { MigrationContext } from "@/lib/db/migrator";

export async function up({ context: q }: { context: MigrationContext }) {
  await q.createTable("designs", {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    organization_id: { type: DataTypes.UUID, allowNull: false, references: { model: "organizations", key: "id" }, onDelete: "CASCADE" },
    project_id: { type: DataTypes.UUID, allowNull: false, unique: true, references: { model: "projects", key: "id" }, onDelete: "CASCADE" },
    draft: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
    // "incomplete" until the draft parses as a whole design, then the review's worst result.
    review_status: { type: DataTypes.STRING(12), allowNull: false, defaultValue: "incomplete" },
    review_summary: { type: DataTypes.JSONB },
    revision: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
    updated_by_id: { type: DataTypes.UUID, references: { model: "users", key: "id" }, onDelete: "SET NULL" },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await q.sequelize.query(
    `alter table designs add constraint designs_review_status_check check (review_status in ('incomplete','pass','warn','fail'))`,
  );
}

export async function down({ context: q }: { context: MigrationContext }) {
  await q.dropTable("designs");
}
