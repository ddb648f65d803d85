import { DataTypes } from "sequelize";
import type { MigrationContext } from "@/lib/db/migrator";

export async function up({ context: q }: { context: MigrationContext }) {
  await q.createTable("api_tokens", {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    organization_id: { type: DataTypes.UUID, allowNull: false, references: { model: "organizations", key: "id" }, onDelete: "CASCADE" },
    name: { type: DataTypes.STRING(60), allowNull: false },
    // SHA-256 of the token, hex; the token itself is shown once and never stored.
    token_hash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
    created_by_id: { type: DataTypes.UUID, references: { model: "users", key: "id" }, onDelete: "SET NULL" },
    last_used_at: { type: DataTypes.DATE },
    revoked_at: { type: DataTypes.DATE },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await q.addIndex("api_tokens", ["organization_id", "created_at"], { name: "api_tokens_organization_created" });
}

export async function down({ context: q }: { context: MigrationContext }) {
  await q.dropTable("api_tokens");
}
