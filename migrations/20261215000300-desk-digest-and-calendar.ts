import { DataTypes } from "sequelize";
import type { MigrationContext } from "@/lib/db/migrator";

export async function up({ context: q }: { context: MigrationContext }) {
  // Each person chooses whether the morning digest comes; it does unless they turn it off.
  await q.addColumn("users", "daily_digest", { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true });
  // A private calendar feed: only the token's hash is kept, and removing it revokes the feed.
  await q.addColumn("users", "calendar_token_hash", { type: DataTypes.STRING(64), allowNull: true, unique: true });
  await q.addColumn("users", "calendar_token_created_at", { type: DataTypes.DATE, allowNull: true });

  // One digest per person and local day: the unique key is what lets two workers run the same morning.
  await q.createTable("desk_digests", {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    organization_id: { type: DataTypes.UUID, allowNull: false },
    user_id: { type: DataTypes.UUID, allowNull: false, references: { model: "users", key: "id" }, onDelete: "CASCADE" },
    local_day: { type: DataTypes.DATEONLY, allowNull: false },
    item_count: { type: DataTypes.INTEGER, allowNull: false },
    outbox_message_id: { type: DataTypes.UUID, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  await q.addIndex("desk_digests", ["user_id", "local_day"], { name: "desk_digests_once_a_day", unique: true });
}

export async function down({ context: q }: { context: MigrationContext }) {
  await q.dropTable("desk_digests");
  await q.removeColumn("users", "calendar_token_created_at");
  await q.removeColumn("users", "calendar_token_hash");
  await q.removeColumn("users", "daily_digest");
}
