import { DataTypes } from "sequelize";
import type { MigrationContext } from "@/lib/db/migrator";

export async function up({ context: q }: { context: MigrationContext }) {
  await q.createTable("share_links", {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    organization_id: { type: DataTypes.UUID, allowNull: false, references: { model: "organizations", key: "id" }, onDelete: "CASCADE" },
    project_id: { type: DataTypes.UUID, allowNull: false, references: { model: "projects", key: "id" }, onDelete: "CASCADE" },
    // SHA-256 of the token; the token itself is shown once and never stored.
    token_hash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
    recipient_email: { type: DataTypes.STRING(254) },
    note: { type: DataTypes.TEXT, allowNull: false, defaultValue: "" },
    expires_at: { type: DataTypes.DATE, allowNull: false },
    revoked_at: { type: DataTypes.DATE },
    created_by_id: { type: DataTypes.UUID, references: { model: "users", key: "id" }, onDelete: "SET NULL" },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await q.addIndex("share_links", ["project_id"], { name: "share_links_project" });

  await q.createTable("share_link_packets", {
    share_link_id: { type: DataTypes.UUID, primaryKey: true, references: { model: "share_links", key: "id" }, onDelete: "CASCADE" },
    packet_id: { type: DataTypes.UUID, primaryKey: true, references: { model: "packets", key: "id" }, onDelete: "CASCADE" },
  });

  await q.createTable("share_link_accesses", {
    id: { type: DataTypes.BIGINT, primaryKey: true, autoIncrement: true },
    share_link_id: { type: DataTypes.UUID, allowNull: false, references: { model: "share_links", key: "id" }, onDelete: "CASCADE" },
    kind: { type: DataTypes.STRING(10), allowNull: false },
    packet_id: { type: DataTypes.UUID, references: { model: "packets", key: "id" }, onDelete: "SET NULL" },
    address: { type: DataTypes.STRING(100), allowNull: false },
    user_agent: { type: DataTypes.STRING(500), allowNull: false, defaultValue: "" },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  await q.sequelize.query(
    `alter table share_link_accesses add constraint share_link_accesses_kind_check check (kind in ('view','download'))`,
  );
  await q.addIndex("share_link_accesses", ["share_link_id", "created_at"], { name: "share_link_accesses_link_time" });

  // Unknown tokens per client address, counted to slow down guessing.
  await q.createTable("share_link_misses", {
    id: { type: DataTypes.BIGINT, primaryKey: true, autoIncrement: true },
    address: { type: DataTypes.STRING(100), allowNull: false },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  await q.addIndex("share_link_misses", ["address", "created_at"], { name: "share_link_misses_address_time" });
}

export async function down({ context: q }: { context: MigrationContext }) {
  await q.dropTable("share_link_misses");
  await q.dropTable("share_link_accesses");
  await q.dropTable("share_link_packets");
  await q.dropTable("share_links");
}
